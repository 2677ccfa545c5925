import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Bridge extends Model<InferAttributes<Bridge>, InferCreationAttributes<Bridge>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare units: 'ft' | 'm';
  declare currentRevision: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Bridge.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        units: { type: DataTypes.STRING(2), allowNull: false },
        currentRevision: { type: DataTypes.INTEGER, allowNull: false, field: 'current_revision' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'bridges' },
    );
  }
}
