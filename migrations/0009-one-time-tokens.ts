import { DataTypes, type QueryInterface } from 'sequelize';

type Ctx = { context: QueryInterface };

/**
 * Joining and recovering access by e-mail. `one_time_tokens` holds the links sent by mail (an invite
 * or a password reset) as the SHA-256 of the token only, never the token itself, with when the link
 * stops working and when it was used (a link works once). `users.invited_at` marks an account whose
 * person has not yet chosen a password from the invite. `auth_requests` counts reset requests and
 * failed link uses per client address and per account, shared by every app server on the database.
 */
export async function up({ context: qi }: Ctx): Promise<void> {
  await qi.createTable('one_time_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    purpose: { type: DataTypes.STRING(10), allowNull: false },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('one_time_tokens', ['user_id', 'purpose'], { name: 'one_time_tokens_user' });
  await qi.addColumn('users', 'invited_at', { type: DataTypes.DATE, allowNull: true });
  await qi.createTable('auth_requests', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    client: { type: DataTypes.STRING(100), allowNull: false },
    account: { type: DataTypes.STRING(254), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('auth_requests', ['kind', 'client', 'created_at'], { name: 'auth_requests_client' });
  await qi.addIndex('auth_requests', ['kind', 'account', 'created_at'], { name: 'auth_requests_account' });
}

export async function down({ context: qi }: Ctx): Promise<void> {
  await qi.dropTable('auth_requests');
  await qi.removeColumn('users', 'invited_at');
  await qi.dropTable('one_time_tokens');
}
