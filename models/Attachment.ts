import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * A photo or PDF kept for a bridge (optionally for one check). The file lives under DATA_DIR/uploads
 * with a generated name; the name the user gave is kept only as display text.
 */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare bridgeId: number;
  declare checkId: number | null;
  declare userId: number | null;
  /** Generated file name inside the uploads folder (hex + extension); never from user input. */
  declare storedName: string;
  /** The uploader's file name, neutralised (no folders, no control characters); display only. */
  declare originalName: string;
  /** Content type decided from the file's first bytes. */
  declare contentType: string;
  declare size: number;
  declare caption: string;
  /** The phone's key for a photo sent from its offline store; a resend with it returns this row. */
  declare clientKey: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Attachment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        bridgeId: { type: DataTypes.INTEGER, allowNull: false, field: 'bridge_id' },
        checkId: { type: DataTypes.INTEGER, allowNull: true, field: 'check_id' },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        storedName: { type: DataTypes.STRING(80), allowNull: false, field: 'stored_name' },
        originalName: { type: DataTypes.STRING(200), allowNull: false, field: 'original_name' },
        contentType: { type: DataTypes.STRING(60), allowNull: false, field: 'content_type' },
        size: { type: DataTypes.INTEGER, allowNull: false },
        caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        clientKey: { type: DataTypes.STRING(64), allowNull: true, field: 'client_key' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'attachments', updatedAt: false },
    );
  }
}
