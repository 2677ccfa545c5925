import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * An e-mail captured locally because no SMTP server is configured. The full message (RFC 5322 text)
 * is kept as written by nodemailer, plus the parts an administrator reads at a glance.
 */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare sender: string;
  /** Recipients as JSON text (an array of addresses). */
  declare recipients: string;
  declare subject: string;
  declare textBody: string;
  /** Attachments as JSON text: [{ filename, contentType, size, content }] (text attachments only). */
  declare attachments: string;
  declare raw: string;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        sender: { type: DataTypes.STRING(254), allowNull: false },
        recipients: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false, field: 'text_body' },
        attachments: { type: DataTypes.TEXT, allowNull: false },
        raw: { type: DataTypes.TEXT, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'outbox_messages', updatedAt: false },
    );
  }
}
