import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One saved bridge description. Revisions are never edited: a change is a new revision. */
export class GeometryRevision extends Model<InferAttributes<GeometryRevision>, InferCreationAttributes<GeometryRevision>> {
  declare id: CreationOptional<number>;
  declare bridgeId: number;
  declare revision: number;
  /** The bridge description as JSON text (bridge-format). */
  declare description: string;
  declare authorId: number | null;
  declare note: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    GeometryRevision.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        bridgeId: { type: DataTypes.INTEGER, allowNull: false, field: 'bridge_id' },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false },
        authorId: { type: DataTypes.INTEGER, allowNull: true, field: 'author_id' },
        note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'geometry_revisions', updatedAt: false },
    );
  }
}
