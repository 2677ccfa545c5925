import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One counted request of a kind (a reset request, a failed link use) by client address and account. */
export class AuthRequest extends Model<InferAttributes<AuthRequest>, InferCreationAttributes<AuthRequest>> {
  declare id: CreationOptional<number>;
  declare kind: string;
  declare client: string;
  declare account: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuthRequest.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        client: { type: DataTypes.STRING(100), allowNull: false },
        account: { type: DataTypes.STRING(254), allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'auth_requests', updatedAt: false },
    );
  }
}
