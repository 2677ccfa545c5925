import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One committed top-of-girder survey file: who imported it, when, against which revision. */
export class SurveyImport extends Model<InferAttributes<SurveyImport>, InferCreationAttributes<SurveyImport>> {
  declare id: CreationOptional<number>;
  declare bridgeId: number;
  declare userId: number | null;
  declare filename: string;
  /** The geometry revision the rows were checked against. */
  declare revision: number;
  declare rowCount: number;
  /** How many of the rows replaced an earlier value of the same point. */
  declare replacedCount: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SurveyImport.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        bridgeId: { type: DataTypes.INTEGER, allowNull: false, field: 'bridge_id' },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        filename: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        rowCount: { type: DataTypes.INTEGER, allowNull: false, field: 'row_count' },
        replacedCount: { type: DataTypes.INTEGER, allowNull: false, field: 'replaced_count' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'survey_imports', updatedAt: false },
    );
  }
}
