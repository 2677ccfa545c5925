import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Bridge extends Model<InferAttributes<Bridge>, InferCreationAttributes<Bridge>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare units: 'ft' | 'm';
  declare currentRevision: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Field-check tolerance on edge width, bridge units; null means the default for the units. */
  declare widthTolerance: CreationOptional<number | null>;
  /** Field-check tolerance on the level-bar reading, bridge units; null means the default. */
  declare readingTolerance: CreationOptional<number | null>;
  /** Shortest level-bar rod on the field sheet, bridge units; null means the default. */
  declare baseRodLength: CreationOptional<number | null>;

  static initModel(sequelize: Sequelize): void {
    Bridge.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        units: { type: DataTypes.STRING(2), allowNull: false },
        currentRevision: { type: DataTypes.INTEGER, allowNull: false, field: 'current_revision' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
        widthTolerance: { type: DataTypes.DOUBLE, allowNull: true, field: 'width_tolerance' },
        readingTolerance: { type: DataTypes.DOUBLE, allowNull: true, field: 'reading_tolerance' },
        baseRodLength: { type: DataTypes.DOUBLE, allowNull: true, field: 'base_rod_length' },
      },
      { sequelize, tableName: 'bridges' },
    );
  }
}
