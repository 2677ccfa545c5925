import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * One surveyed top-of-girder elevation at one girder point of a bridge. Rows are never edited except
 * to mark them replaced: a later import of the same point adds a new row and stamps the old one with
 * `replacedAt`, so the history of every point stays readable.
 */
export class GirderSurvey extends Model<InferAttributes<GirderSurvey>, InferCreationAttributes<GirderSurvey>> {
  declare id: CreationOptional<number>;
  declare bridgeId: number;
  declare importId: number;
  declare girder: string;
  declare span: number;
  declare point: number;
  /** Top of girder elevation, bridge units. */
  declare elevation: number;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  /** When a later import replaced this value; null while it is the current one. */
  declare replacedAt: CreationOptional<Date | null>;

  static initModel(sequelize: Sequelize): void {
    GirderSurvey.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        bridgeId: { type: DataTypes.INTEGER, allowNull: false, field: 'bridge_id' },
        importId: { type: DataTypes.INTEGER, allowNull: false, field: 'import_id' },
        girder: { type: DataTypes.STRING(60), allowNull: false },
        span: { type: DataTypes.INTEGER, allowNull: false },
        point: { type: DataTypes.INTEGER, allowNull: false },
        elevation: { type: DataTypes.DOUBLE, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        replacedAt: { type: DataTypes.DATE, allowNull: true, field: 'replaced_at' },
      },
      { sequelize, tableName: 'girder_surveys', updatedAt: false },
    );
  }
}
