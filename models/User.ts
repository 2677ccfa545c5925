import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '@/lib/auth/roles';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: string;
  /** Every session token carries the version it was issued under; a bump ends all earlier sessions. */
  declare sessionVersion: CreationOptional<number>;
  declare disabledAt: CreationOptional<Date | null>;
  /** Removed accounts stay as rows (their checks and revisions keep their author) but never sign in. */
  declare removedAt: CreationOptional<Date | null>;
  declare lastSeenAt: CreationOptional<Date | null>;
  /** Set while an invited person has not yet chosen a password from the e-mailed link. */
  declare invitedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false, field: 'password_hash' },
        sessionVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'session_version' },
        disabledAt: { type: DataTypes.DATE, allowNull: true, field: 'disabled_at' },
        removedAt: { type: DataTypes.DATE, allowNull: true, field: 'removed_at' },
        lastSeenAt: { type: DataTypes.DATE, allowNull: true, field: 'last_seen_at' },
        invitedAt: { type: DataTypes.DATE, allowNull: true, field: 'invited_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'users' },
    );
  }
}
