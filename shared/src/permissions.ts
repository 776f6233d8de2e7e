import type { Role } from './roles.js';

/**
 * Every action of the API and the roles that may take it. Site scoping is applied on top of
 * this table by the server's services: a role that may take an action still needs the record's
 * site among its sites.
 */
export const PERMISSIONS = {
  'session.read': ['administrator', 'reliability_engineer', 'technician', 'safety_officer', 'viewer'],
  'preferences.update': ['administrator', 'reliability_engineer', 'technician', 'safety_officer', 'viewer'],
  'sites.list': ['administrator', 'reliability_engineer', 'technician', 'safety_officer', 'viewer'],
  'users.list': ['administrator'],
  'users.read': ['administrator'],
  'users.invite': ['administrator'],
  'users.update': ['administrator'],
  'users.deactivate': ['administrator'],
  'users.reactivate': ['administrator'],
  'users.resend-invite': ['administrator'],
  'audit.read': ['administrator'],

  'register.read': ['administrator', 'reliability_engineer', 'technician', 'safety_officer', 'viewer'],
  'sites.create': ['administrator'],
  'sites.update': ['administrator'],
  'areas.edit': ['administrator', 'reliability_engineer'],
  'equipment.edit': ['administrator', 'reliability_engineer'],
  'service-settings.update': ['administrator', 'reliability_engineer'],
  'constructions.edit': ['administrator', 'reliability_engineer'],
  'fitting-types.edit': ['administrator', 'reliability_engineer'],
  'positions.edit': ['administrator', 'reliability_engineer'],
  'removal-outcomes.update': ['administrator', 'reliability_engineer'],

  'assemblies.build': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.proof-test': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.install': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.replace': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.tag-out': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.remove': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.return-to-stock': ['administrator', 'reliability_engineer', 'technician'],
  'assemblies.scrap': ['administrator', 'reliability_engineer', 'technician'],
  'checks.override': ['administrator', 'reliability_engineer'],
  'events.void': ['administrator', 'reliability_engineer'],
  'imports.run': ['administrator', 'reliability_engineer'],
  'register.export': ['administrator', 'reliability_engineer', 'technician', 'safety_officer', 'viewer'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof PERMISSIONS;

export function roleMay(role: Role, action: Action): boolean {
  return (PERMISSIONS[action] as readonly Role[]).includes(role);
}

/** What a user's site access covers: a list of site ids, or every site including future ones. */
export interface SiteAccess {
  allSites: boolean;
  siteIds: readonly string[];
}

export function canSeeSite(access: SiteAccess, siteId: string): boolean {
  return access.allSites || access.siteIds.includes(siteId);
}

/**
 * Whether `grantor` may hand out `grant`: an administrator limited to some sites can grant only
 * sites of their own and never "all sites".
 */
export function mayGrantSites(grantor: SiteAccess, grant: SiteAccess): boolean {
  if (grantor.allSites) return true;
  if (grant.allSites) return false;
  return grant.siteIds.every((id) => grantor.siteIds.includes(id));
}
