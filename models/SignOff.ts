import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** An inspector's record that a span's overhangs were checked, at one geometry revision. Append-only. */
export class SignOff extends Model<InferAttributes<SignOff>, InferCreationAttributes<SignOff>> {
  declare id: CreationOptional<number>;
  declare bridgeId: number;
  declare span: number;
  /** The geometry revision every passing check was made against. */
  declare revision: number;
  declare userId: number | null;
  declare note: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SignOff.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        bridgeId: { type: DataTypes.INTEGER, allowNull: false, field: 'bridge_id' },
        span: { type: DataTypes.INTEGER, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'sign_offs', updatedAt: false },
    );
  }
}
