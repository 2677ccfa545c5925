import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One failed sign-in: the account (normalised e-mail) and the client address it came from. */
export class SignInFailure extends Model<InferAttributes<SignInFailure>, InferCreationAttributes<SignInFailure>> {
  declare id: CreationOptional<number>;
  declare account: string;
  declare client: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SignInFailure.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        account: { type: DataTypes.STRING(254), allowNull: false },
        client: { type: DataTypes.STRING(100), allowNull: false },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'signin_failures', updatedAt: false },
    );
  }
}
