/** A user as GET /api/admin/users returns it (never a password hash). */
export type PublicUserRow = { id: number; email: string; name: string; role: string; createdAt: string; disabled: boolean; lastSeenAt: string | null };
