import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable('bridges', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(200), allowNull: false },
    units: { type: DataTypes.STRING(2), allowNull: false },
    current_revision: { type: DataTypes.INTEGER, allowNull: false },
    ...timestamps,
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.createTable('geometry_revisions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bridge_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'bridges', key: 'id' },
      onDelete: 'CASCADE',
    },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false },
    author_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    ...timestamps,
  });
  // The unique pair is the last line of defence against two saves taking the same revision number.
  await qi.addIndex('geometry_revisions', ['bridge_id', 'revision'], { unique: true, name: 'geometry_revisions_bridge_revision' });
  await qi.createTable('audit_events', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: true },
    action: { type: DataTypes.STRING(60), allowNull: false },
    entity_type: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.STRING(254), allowNull: true },
    detail: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('audit_events', ['action', 'entity_id', 'created_at'], { name: 'audit_events_action_entity' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.dropTable('audit_events');
  await qi.dropTable('geometry_revisions');
  await qi.dropTable('bridges');
  await qi.dropTable('users');
}
