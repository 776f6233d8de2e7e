import { PERMISSIONS, roleMay, type Action } from '../../../shared/src/permissions.js';
import { DEFAULT_PREFERENCES, type MeDto, type SiteSummary } from '../../../shared/src/schemas/auth.schema.js';
import type { UserDto, UserStatus } from '../../../shared/src/schemas/users.schema.js';
import type { User } from '../entities/index.js';
import type { Actor } from '../policies/actor.js';

export function userStatus(user: Pick<User, 'active' | 'passwordHash' | 'accessExpiresOn'>, today: string): UserStatus {
  if (!user.active) return 'inactive';
  if (user.accessExpiresOn && user.accessExpiresOn < today) return 'expired';
  return user.passwordHash ? 'active' : 'invited';
}

function sitesOf(user: Pick<User, 'allSites' | 'siteIds'>, sites: Map<string, SiteSummary>): SiteSummary[] {
  const ids = user.allSites ? [...sites.keys()] : user.siteIds;
  return ids.flatMap((id) => sites.get(id) ?? []);
}

export function presentMe(user: User, sites: Map<string, SiteSummary>): MeDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    allSites: user.allSites,
    sites: sitesOf(user, sites),
    accessExpiresOn: user.accessExpiresOn,
    preferences: { ...DEFAULT_PREFERENCES, ...user.preferences },
    abilities: (Object.keys(PERMISSIONS) as Action[]).filter((a) => roleMay(user.role, a)),
  };
}

export function presentUser(user: User, actor: Actor, sites: Map<string, SiteSummary>, today = new Date().toISOString().slice(0, 10)): UserDto {
  const status = userStatus(user, today);
  const admin = roleMay(actor.role, 'users.update');
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    allSites: user.allSites,
    sites: sitesOf(user, sites),
    accessExpiresOn: user.accessExpiresOn,
    status,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
    createdAt: user.createdAt.toISOString(),
    abilities: {
      update: admin,
      deactivate: admin && status !== 'inactive' && user.id !== actor.id,
      reactivate: admin && status === 'inactive',
      resendInvite: admin && status === 'invited',
    },
  };
}
