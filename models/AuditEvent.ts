import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Who did what, when, on which record. Append-only. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare userId: number | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  /** Extra facts as JSON text; never a password or a hash. */
  declare detail: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        action: { type: DataTypes.STRING(60), allowNull: false },
        entityType: { type: DataTypes.STRING(40), allowNull: false, field: 'entity_type' },
        entityId: { type: DataTypes.STRING(254), allowNull: true, field: 'entity_id' },
        detail: { type: DataTypes.TEXT, allowNull: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'audit_events', updatedAt: false },
    );
  }
}
