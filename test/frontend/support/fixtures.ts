import { PERMISSIONS, roleMay, type Action } from '@shared/permissions';
import type { Role } from '@shared/roles';
import type { AppMetaDto, MeDto, SiteSummary } from '@shared/schemas/auth.schema';
import type { UserDto } from '@shared/schemas/users.schema';

export const SITES: SiteSummary[] = [
  { id: '7d0c7f8e-1c1a-4c43-9f0a-0d5f1a6c2b01', code: 'PIT1', name: 'North pit' },
  { id: '7d0c7f8e-1c1a-4c43-9f0a-0d5f1a6c2b02', code: 'MILL', name: 'Crusher and mill' },
];

/** The abilities the server grants a role, as it would list them in `/api/auth/me`. */
export function abilitiesOf(role: Role): Action[] {
  return (Object.keys(PERMISSIONS) as Action[]).filter((action) => roleMay(role, action));
}

export function buildMeta(overrides: Partial<AppMetaDto> = {}): AppMetaDto {
  return { mode: 'production', needsSetup: false, companyName: null, ...overrides };
}

export function buildMe(overrides: Partial<MeDto> = {}): MeDto {
  const role = overrides.role ?? 'technician';
  return {
    id: '0b7a3c55-7a1e-4d8c-8a55-1f6b0f2a9c10',
    email: 'avery.fitter@example.test',
    name: 'Avery Fitter',
    role,
    allSites: false,
    sites: [SITES[0]!],
    accessExpiresOn: null,
    preferences: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' },
    abilities: abilitiesOf(role),
    ...overrides,
  };
}

let nextUser = 1;

export function buildUser(overrides: Partial<UserDto> = {}): UserDto {
  const n = nextUser++;
  return {
    id: `3f1e2d4c-0000-4000-8000-${String(n).padStart(12, '0')}`,
    email: `user${n}@example.test`,
    name: `User ${n}`,
    role: 'technician',
    allSites: false,
    sites: [SITES[0]!],
    accessExpiresOn: null,
    status: 'active',
    lastSignInAt: '2026-03-02T07:15:00.000Z',
    createdAt: '2026-01-10T09:00:00.000Z',
    abilities: { update: true, deactivate: true, reactivate: false, resendInvite: false },
    ...overrides,
  };
}
