/** A user as GET /api/admin/users returns it: the server's one public shape of a user (never a password hash). */
export type { PublicUser as PublicUserRow } from '@/lib/services/users';
