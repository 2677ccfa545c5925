import type { Sequelize } from 'sequelize';
import { User } from './User';
import { Bridge } from './Bridge';
import { GeometryRevision } from './GeometryRevision';
import { AuditEvent } from './AuditEvent';

export { User, Bridge, GeometryRevision, AuditEvent };

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
}
