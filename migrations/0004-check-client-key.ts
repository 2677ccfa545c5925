import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * A key the field screen gives each typed measurement, so a resend after a lost answer returns the
 * check already recorded instead of recording it twice.
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.addColumn('field_checks', 'client_key', { type: DataTypes.STRING(64), allowNull: true });
  await qi.addIndex('field_checks', ['bridge_id', 'client_key'], { unique: true, name: 'field_checks_client_key' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.removeIndex('field_checks', 'field_checks_client_key');
  await qi.removeColumn('field_checks', 'client_key');
}
