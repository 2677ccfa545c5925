/** The four roles. Writes need the named role (admin may do everything); reads need any sign-in. */
export const ROLES = ['admin', 'engineer', 'inspector', 'crew'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  engineer: 'Engineer',
  inspector: 'Inspector',
  crew: 'Crew (read only)',
};

/** True when a user holding `role` may do what `allowed` lists; admin passes every check. */
export function roleAllows(role: Role, allowed: readonly Role[]): boolean {
  return role === 'admin' || allowed.includes(role);
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
