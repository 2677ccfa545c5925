import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * Session revocation and account state: a session version every session token must match (bumped by
 * sign-out, password, role change, disabling and removal), when the account was disabled or removed
 * (removed accounts stay as rows so checks and revisions keep their author), and when it was last
 * seen (idle timeout). Failed sign-ins are kept in their own table, counted per account and per
 * client address across every app server that shares the database.
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.addColumn('users', 'session_version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  await qi.addColumn('users', 'disabled_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('users', 'removed_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('users', 'last_seen_at', { type: DataTypes.DATE, allowNull: true });
  await qi.createTable('signin_failures', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    account: { type: DataTypes.STRING(254), allowNull: false },
    client: { type: DataTypes.STRING(100), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('signin_failures', ['account', 'created_at'], { name: 'signin_failures_account' });
  await qi.addIndex('signin_failures', ['client', 'created_at'], { name: 'signin_failures_client' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.dropTable('signin_failures');
  await qi.removeColumn('users', 'last_seen_at');
  await qi.removeColumn('users', 'removed_at');
  await qi.removeColumn('users', 'disabled_at');
  await qi.removeColumn('users', 'session_version');
}
