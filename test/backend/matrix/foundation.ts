import type { User } from '../../../backend/src/entities/index.js';
import { buildUser } from '../../support/factories.js';
import { everyone, only, type Expectations, type Fixtures } from './types.js';

const onlyAdmin = (ok: number) => only(['administrator'], ok);

const siteBUser = (fx: Fixtures, overrides: Partial<User> & { password?: string | null } = {}) =>
  buildUser(fx.server.ctx, { allSites: false, siteIds: [fx.siteB.id], ...overrides });

export const FOUNDATION_EXPECTATIONS: Expectations = {
  'GET /meta': { anonymous: 200, roles: everyone(200), prepare: async () => ({ path: '/api/meta' }) },
  'POST /auth/sign-in': {
    anonymous: 401,
    roles: everyone(401),
    prepare: async () => ({ path: '/api/auth/sign-in', body: { email: `nobody-${Math.random().toString(36).slice(2)}@ferrule.test`, password: 'not-the-password-1' } }),
  },
  'POST /auth/sign-out': { anonymous: 401, roles: everyone(204), prepare: async () => ({ path: '/api/auth/sign-out' }) },
  'POST /auth/sign-out-everywhere': { anonymous: 401, roles: everyone(204), prepare: async () => ({ path: '/api/auth/sign-out-everywhere' }) },
  'GET /auth/me': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/auth/me' }) },
  'PUT /me/preferences': {
    anonymous: 401,
    roles: everyone(200),
    prepare: async () => ({ path: '/api/me/preferences', body: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } }),
  },
  'POST /auth/password-reset': {
    anonymous: 202,
    roles: everyone(202),
    prepare: async () => ({ path: '/api/auth/password-reset', body: { email: 'nobody@ferrule.test' } }),
  },
  'POST /auth/password-reset/complete': {
    anonymous: 400,
    roles: everyone(400),
    prepare: async () => ({ path: '/api/auth/password-reset/complete', body: { token: 'x'.repeat(43), password: 'valve-seat-gasket-9' } }),
  },
  'POST /auth/invitations/accept': {
    anonymous: 400,
    roles: everyone(400),
    prepare: async () => ({ path: '/api/auth/invitations/accept', body: { token: 'x'.repeat(43), password: 'valve-seat-gasket-9' } }),
  },
  'POST /setup': {
    anonymous: 403,
    roles: everyone(403),
    prepare: async () => ({ path: '/api/setup', body: { token: 'x'.repeat(43), email: 'first@ferrule.test', name: 'First', password: 'valve-seat-gasket-9' } }),
  },
  'GET /sites': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/sites' }) },
  'GET /users': { anonymous: 401, roles: onlyAdmin(200), prepare: async () => ({ path: '/api/users' }) },
  'POST /users': {
    anonymous: 401,
    roles: onlyAdmin(201),
    outOfScope: 403,
    prepare: async (fx) => ({
      path: '/api/users',
      body: { email: `invitee-${Math.random().toString(36).slice(2)}@ferrule.test`, name: 'New Fitter', role: 'technician', allSites: false, siteIds: [fx.siteB.id] },
    }),
  },
  'GET /users/:id': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx)).id}` }),
  },
  'PATCH /users/:id': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx)).id}`, body: { name: 'Renamed Fitter' } }),
  },
  'POST /users/:id/deactivate': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx)).id}/deactivate` }),
  },
  'POST /users/:id/reactivate': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx, { active: false })).id}/reactivate` }),
  },
  'POST /users/:id/resend-invite': {
    anonymous: 401,
    roles: onlyAdmin(202),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/users/${(await siteBUser(fx, { password: null })).id}/resend-invite` }),
  },
  'GET /audit': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/audit', query: { entityType: 'user', entityId: (await siteBUser(fx)).id } }),
  },
};

