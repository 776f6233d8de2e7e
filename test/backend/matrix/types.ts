import type { Role } from '../../../shared/src/roles.js';
import { ROLES } from '../../../shared/src/roles.js';
import type { Site } from '../../../backend/src/entities/index.js';
import type { TestServer } from '../../support/api.js';

/** What every expectation may use: the server and two sites; site B is outside the limited administrator's sites. */
export interface Fixtures {
  server: TestServer;
  siteA: Site;
  siteB: Site;
}

export interface Prepared {
  path: string;
  body?: unknown;
  query?: Record<string, string>;
  /** A multipart upload: the file under `field`, and `body`'s entries as text fields. */
  file?: { field: string; name: string; content: string };
}

/**
 * One route's expected statuses: without a session, for each role (with access to all sites),
 * and for a caller whose sites do not include the record.
 */
export interface Expectation {
  anonymous: number;
  roles: Record<Role, number>;
  /** Status when a user of the route's permitted role, limited to site A, acts on a record of site B. */
  outOfScope?: number;
  /** The role of that limited user; default administrator. */
  outOfScopeRole?: Role;
  /** Builds the request afresh for each call, making whatever records it needs (in site B). */
  prepare: (fx: Fixtures) => Promise<Prepared>;
}

export type Expectations = Record<string, Expectation>;

export const everyone = (status: number): Record<Role, number> => Object.fromEntries(ROLES.map((r) => [r, status])) as Record<Role, number>;

/** `ok` for the listed roles, 403 for the others. */
export const only = (roles: readonly Role[], ok: number): Record<Role, number> =>
  Object.fromEntries(ROLES.map((r) => [r, roles.includes(r) ? ok : 403])) as Record<Role, number>;

export const EDITORS = ['administrator', 'reliability_engineer'] as const satisfies readonly Role[];
export const FIELD = ['administrator', 'reliability_engineer', 'technician'] as const satisfies readonly Role[];
