import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

const bridgeRef = {
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: 'bridges', key: 'id' },
  onDelete: 'CASCADE',
} as const;
const userRef = { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' } as const;
const createdAt = { type: DataTypes.DATE, allowNull: false };

/**
 * Field work: checks at each bracket, photos, sign-offs, the local mail outbox, and per-bridge
 * tolerances and base rod length (null means the default for the bridge's units).
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.addColumn('bridges', 'width_tolerance', { type: DataTypes.DOUBLE, allowNull: true });
  await qi.addColumn('bridges', 'reading_tolerance', { type: DataTypes.DOUBLE, allowNull: true });
  await qi.addColumn('bridges', 'base_rod_length', { type: DataTypes.DOUBLE, allowNull: true });

  await qi.createTable('field_checks', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bridge_id: bridgeRef,
    revision: { type: DataTypes.INTEGER, allowNull: false },
    span: { type: DataTypes.INTEGER, allowNull: false },
    girder: { type: DataTypes.STRING(60), allowNull: false },
    point: { type: DataTypes.INTEGER, allowNull: false },
    side: { type: DataTypes.STRING(10), allowNull: false },
    station: { type: DataTypes.DOUBLE, allowNull: false },
    measured_edge_width: { type: DataTypes.DOUBLE, allowNull: true },
    computed_edge_width: { type: DataTypes.DOUBLE, allowNull: true },
    width_deviation: { type: DataTypes.DOUBLE, allowNull: true },
    width_tolerance: { type: DataTypes.DOUBLE, allowNull: false },
    width_pass: { type: DataTypes.BOOLEAN, allowNull: true },
    measured_drop_from_girder_top: { type: DataTypes.DOUBLE, allowNull: true },
    computed_drop_from_girder_top: { type: DataTypes.DOUBLE, allowNull: true },
    reading_deviation: { type: DataTypes.DOUBLE, allowNull: true },
    reading_tolerance: { type: DataTypes.DOUBLE, allowNull: false },
    reading_pass: { type: DataTypes.BOOLEAN, allowNull: true },
    pass: { type: DataTypes.BOOLEAN, allowNull: false },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    supersedes_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'field_checks', key: 'id' }, onDelete: 'SET NULL' },
    user_id: userRef,
    created_at: createdAt,
  });
  await qi.addIndex('field_checks', ['bridge_id', 'span', 'girder', 'point', 'id'], { name: 'field_checks_bracket' });

  await qi.createTable('attachments', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bridge_id: bridgeRef,
    check_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'field_checks', key: 'id' }, onDelete: 'SET NULL' },
    user_id: userRef,
    stored_name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    original_name: { type: DataTypes.STRING(200), allowNull: false },
    content_type: { type: DataTypes.STRING(60), allowNull: false },
    size: { type: DataTypes.INTEGER, allowNull: false },
    caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    created_at: createdAt,
  });
  await qi.addIndex('attachments', ['bridge_id', 'created_at'], { name: 'attachments_bridge' });

  await qi.createTable('sign_offs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bridge_id: bridgeRef,
    span: { type: DataTypes.INTEGER, allowNull: false },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    user_id: userRef,
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    created_at: createdAt,
  });
  await qi.addIndex('sign_offs', ['bridge_id', 'span', 'revision'], { unique: true, name: 'sign_offs_bridge_span_revision' });

  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    sender: { type: DataTypes.STRING(254), allowNull: false },
    recipients: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    attachments: { type: DataTypes.TEXT, allowNull: false },
    raw: { type: DataTypes.TEXT, allowNull: false },
    user_id: userRef,
    created_at: createdAt,
  });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.dropTable('outbox_messages');
  await qi.dropTable('sign_offs');
  await qi.dropTable('attachments');
  await qi.dropTable('field_checks');
  await qi.removeColumn('bridges', 'base_rod_length');
  await qi.removeColumn('bridges', 'reading_tolerance');
  await qi.removeColumn('bridges', 'width_tolerance');
}
