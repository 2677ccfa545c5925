/** A user as GET /api/admin/users returns it (never a password hash); an invited person shows as pending until they choose a password. */
export type PublicUserRow = {
  id: number;
  email: string;
  name: string;
  role: string;
  createdAt: string;
  disabled: boolean;
  lastSeenAt: string | null;
  invitePending: boolean;
  inviteExpiresAt: string | null;
  inviteExpired: boolean;
};
