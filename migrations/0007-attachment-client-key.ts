import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * A key the phone gives each photo it keeps while offline, so a resend after a lost answer returns the
 * attachment already stored instead of storing the photo twice.
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.addColumn('attachments', 'client_key', { type: DataTypes.STRING(64), allowNull: true });
  await qi.addIndex('attachments', ['bridge_id', 'client_key'], { unique: true, name: 'attachments_client_key' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.removeIndex('attachments', 'attachments_client_key');
  await qi.removeColumn('attachments', 'client_key');
}
