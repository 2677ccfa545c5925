import type { Sequelize } from 'sequelize';
import { User } from './User';
import { Bridge } from './Bridge';
import { GeometryRevision } from './GeometryRevision';
import { AuditEvent } from './AuditEvent';
import { FieldCheck } from './FieldCheck';
import { Attachment } from './Attachment';
import { SignOff } from './SignOff';
import { OutboxMessage } from './OutboxMessage';
import { GirderSurvey } from './GirderSurvey';
import { SurveyImport } from './SurveyImport';
import { SignInFailure } from './SignInFailure';
import { OneTimeToken } from './OneTimeToken';
import { AuthRequest } from './AuthRequest';

export { User, Bridge, GeometryRevision, AuditEvent };
export { FieldCheck, Attachment, SignOff, OutboxMessage };
export { GirderSurvey, SurveyImport };
export { SignInFailure };
export { OneTimeToken, AuthRequest };
export type { TokenPurpose } from './OneTimeToken';

/** Binds every model to the connection and declares the associations. Call once per connection. */
export function initModels(sequelize: Sequelize): void {
  User.initModel(sequelize);
  Bridge.initModel(sequelize);
  GeometryRevision.initModel(sequelize);
  AuditEvent.initModel(sequelize);

  Bridge.hasMany(GeometryRevision, { foreignKey: 'bridgeId', as: 'revisions', onDelete: 'CASCADE' });
  GeometryRevision.belongsTo(Bridge, { foreignKey: 'bridgeId', as: 'bridge' });
  GeometryRevision.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  AuditEvent.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  // Field work (issue 6).
  FieldCheck.initModel(sequelize);
  Attachment.initModel(sequelize);
  SignOff.initModel(sequelize);
  OutboxMessage.initModel(sequelize);
  FieldCheck.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  FieldCheck.hasMany(Attachment, { foreignKey: 'checkId', as: 'photos' });
  Attachment.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  SignOff.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  // Top-of-girder survey (issue 4, part B).
  SurveyImport.initModel(sequelize);
  GirderSurvey.initModel(sequelize);
  SurveyImport.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  GirderSurvey.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  // Sign-in throttle (issue 11).
  SignInFailure.initModel(sequelize);

  // Invites and password resets by e-mail (issue 14).
  OneTimeToken.initModel(sequelize);
  AuthRequest.initModel(sequelize);
  OneTimeToken.belongsTo(User, { foreignKey: 'userId', as: 'user', onDelete: 'CASCADE' });
}
