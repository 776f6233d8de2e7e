import type { Role } from '../../../shared/src/roles.js';

/** The signed-in user a request acts for, as re-read from the database on every request. */
export interface Actor {
  id: string;
  email: string;
  name: string;
  role: Role;
  allSites: boolean;
  siteIds: string[];
  sessionId: string;
}
