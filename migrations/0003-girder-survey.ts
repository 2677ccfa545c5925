import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/** Top-of-girder survey imports and their values (history kept: replaced rows are stamped, not deleted). */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.createTable('survey_imports', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bridge_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'bridges', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    filename: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    row_count: { type: DataTypes.INTEGER, allowNull: false },
    replaced_count: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('survey_imports', ['bridge_id', 'created_at'], { name: 'survey_imports_bridge' });
  await qi.createTable('girder_surveys', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    bridge_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'bridges', key: 'id' }, onDelete: 'CASCADE' },
    import_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'survey_imports', key: 'id' }, onDelete: 'CASCADE' },
    girder: { type: DataTypes.STRING(60), allowNull: false },
    span: { type: DataTypes.INTEGER, allowNull: false },
    point: { type: DataTypes.INTEGER, allowNull: false },
    elevation: { type: DataTypes.DOUBLE, allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    replaced_at: { type: DataTypes.DATE, allowNull: true },
  });
  await qi.addIndex('girder_surveys', ['bridge_id', 'girder', 'span', 'point'], { name: 'girder_surveys_point' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.dropTable('girder_surveys');
  await qi.dropTable('survey_imports');
}
