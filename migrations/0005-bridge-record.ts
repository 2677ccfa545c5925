import { DataTypes, Op, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

const text = (length: number) => ({ type: DataTypes.STRING(length), allowNull: false, defaultValue: '' });
const count = { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 };

/**
 * The bridge record a district files a bridge by (structure number, route, feature crossed, district,
 * contractor, stage), and the portfolio's status counters kept on the bridge row so the bridges list
 * reads one indexed page instead of every check: brackets passing of all, open failures, spans signed
 * off and spans waiting for sign-off, the last field activity and the last activity of any kind.
 * Empty text is '' (not null) so sorting and keyset paging work the same on SQLite and PostgreSQL.
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.addColumn('bridges', 'structure_number', text(40));
  await qi.addColumn('bridges', 'route', text(120));
  await qi.addColumn('bridges', 'feature_crossed', text(200));
  await qi.addColumn('bridges', 'district', text(120));
  await qi.addColumn('bridges', 'contractor', text(200));
  await qi.addColumn('bridges', 'stage', { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'design' });
  await qi.addColumn('bridges', 'brackets_total', count);
  await qi.addColumn('bridges', 'brackets_passing', count);
  await qi.addColumn('bridges', 'open_failures', count);
  await qi.addColumn('bridges', 'spans_total', count);
  await qi.addColumn('bridges', 'spans_signed_off', count);
  await qi.addColumn('bridges', 'spans_awaiting_signoff', count);
  await qi.addColumn('bridges', 'last_field_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('bridges', 'activity_at', { type: DataTypes.DATE, allowNull: true });
  await qi.sequelize.query('UPDATE bridges SET activity_at = updated_at');

  await qi.addIndex('bridges', ['activity_at', 'id'], { name: 'bridges_activity' });
  await qi.addIndex('bridges', ['name', 'id'], { name: 'bridges_name' });
  await qi.addIndex('bridges', ['structure_number', 'id'], { name: 'bridges_structure_number' });
  await qi.addIndex('bridges', ['district', 'activity_at', 'id'], { name: 'bridges_district' });
  await qi.addIndex('bridges', ['stage', 'activity_at', 'id'], { name: 'bridges_stage' });
  // Partial indexes (SQLite and PostgreSQL both have them): the few bridges that need attention.
  await qi.addIndex('bridges', ['activity_at', 'id'], { name: 'bridges_failures', where: { open_failures: { [Op.gt]: 0 } } });
  await qi.addIndex('bridges', ['activity_at', 'id'], { name: 'bridges_awaiting_signoff', where: { spans_awaiting_signoff: { [Op.gt]: 0 } } });
  // One bridge's audit log and its check photos are read by bridge; without these both scan whole tables.
  await qi.addIndex('audit_events', ['entity_type', 'entity_id', 'id'], { name: 'audit_events_entity' });
  await qi.addIndex('attachments', ['check_id'], { name: 'attachments_check' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  for (const [table, name] of [
    ['attachments', 'attachments_check'],
    ['audit_events', 'audit_events_entity'],
    ['bridges', 'bridges_awaiting_signoff'],
    ['bridges', 'bridges_failures'],
    ['bridges', 'bridges_stage'],
    ['bridges', 'bridges_district'],
    ['bridges', 'bridges_structure_number'],
    ['bridges', 'bridges_name'],
    ['bridges', 'bridges_activity'],
  ]) {
    await qi.removeIndex(table, name);
  }
  for (const column of [
    'activity_at',
    'last_field_at',
    'spans_awaiting_signoff',
    'spans_signed_off',
    'spans_total',
    'open_failures',
    'brackets_passing',
    'brackets_total',
    'stage',
    'contractor',
    'district',
    'feature_crossed',
    'route',
    'structure_number',
  ]) {
    await qi.removeColumn('bridges', column);
  }
}
