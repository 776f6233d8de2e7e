import type { UserDto, UserStatus } from '@shared/schemas/users.schema';
import { ROLES, ROLE_LABELS } from '@shared/roles';

export const STATUS_LABELS: Record<UserStatus, string> = {
  active: 'Active',
  invited: 'Invited',
  expired: 'Access expired',
  inactive: 'Inactive',
};

export const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export const STATUS_OPTIONS = (Object.keys(STATUS_LABELS) as UserStatus[]).map((status) => ({ value: status, label: STATUS_LABELS[status] }));

/** "All sites", one site's name, or the names of a few sites. */
export function describeUserSites(user: Pick<UserDto, 'allSites' | 'sites'>): string {
  if (user.allSites) return 'All sites';
  if (user.sites.length === 0) return 'No sites';
  if (user.sites.length <= 2) return user.sites.map((s) => s.name).join(', ');
  return `${user.sites[0]?.name ?? ''} and ${user.sites.length - 1} more`;
}
