import { db } from '@/lib/db/connection';

/** Touches the database so a broken store shows up as a failed health check. */
export async function healthCheck(): Promise<{ ok: true }> {
  const sequelize = await db();
  await sequelize.query('SELECT 1');
  return { ok: true };
}
