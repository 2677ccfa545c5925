import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** What a one-time link is for: an invite to choose a first password, or a password reset. */
export type TokenPurpose = 'invite' | 'reset';

/** A link sent by e-mail, kept as the SHA-256 (hex) of its token only; it works once, until `expiresAt`. */
export class OneTimeToken extends Model<InferAttributes<OneTimeToken>, InferCreationAttributes<OneTimeToken>> {
  declare id: CreationOptional<number>;
  declare purpose: TokenPurpose;
  declare userId: number;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    OneTimeToken.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        purpose: { type: DataTypes.STRING(10), allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true, field: 'token_hash' },
        expiresAt: { type: DataTypes.DATE, allowNull: false, field: 'expires_at' },
        usedAt: { type: DataTypes.DATE, allowNull: true, field: 'used_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'one_time_tokens', updatedAt: false },
    );
  }
}
