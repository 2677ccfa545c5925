import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * One lower-case search column per bridge (name, structure number and route, kept by the Bridge model
 * on every save) with a narrow index that holds it beside the portfolio's order, so a search reads
 * one small index instead of three columns of every row.
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.addColumn('bridges', 'search_text', { type: DataTypes.STRING(400), allowNull: false, defaultValue: '' });
  await qi.sequelize.query("UPDATE bridges SET search_text = lower(name || ' ' || structure_number || ' ' || route)");
  await qi.addIndex('bridges', ['search_text', 'activity_at', 'id'], { name: 'bridges_search' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.removeIndex('bridges', 'bridges_search');
  await qi.removeColumn('bridges', 'search_text');
}
