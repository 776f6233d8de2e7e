/** The five roles of Ferrule. They are not a ladder: each action names the roles that may take it. */
export const ROLES = ['administrator', 'reliability_engineer', 'technician', 'safety_officer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  administrator: 'Administrator',
  reliability_engineer: 'Reliability engineer',
  technician: 'Technician',
  safety_officer: 'Safety officer',
  viewer: 'Viewer',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
