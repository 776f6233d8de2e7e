import { z } from 'zod';
import { ROLES, type Role } from '../roles.js';
import { emailSchema, pageQuerySchema, uuidSchema } from './common.schema.js';
import type { SiteSummary } from './auth.schema.js';

const isoDate = z.iso.date({ message: 'Use a date like 2027-03-31' });

const siteAccessFields = {
  allSites: z.boolean({ message: 'Say whether the user sees all sites' }),
  siteIds: z.array(uuidSchema).max(500),
};

export const userInviteSchema = z
  .strictObject({
    email: emailSchema,
    name: z.string({ message: 'Name is required' }).trim().min(1, 'Name is required').max(120, 'Name is at most 120 characters'),
    role: z.enum(ROLES, { message: 'Choose a role' }),
    ...siteAccessFields,
    accessExpiresOn: isoDate.nullable().default(null),
  })
  .refine((v) => v.allSites || v.siteIds.length > 0, { message: 'Choose at least one site, or all sites', path: ['siteIds'] });
export type UserInviteInput = z.infer<typeof userInviteSchema>;

export const userUpdateSchema = z
  .strictObject({
    name: z.string().trim().min(1, 'Name is required').max(120, 'Name is at most 120 characters'),
    role: z.enum(ROLES, { message: 'Choose a role' }),
    ...siteAccessFields,
    accessExpiresOn: isoDate.nullable(),
  })
  .partial()
  .refine((v) => v.allSites !== false || v.siteIds === undefined || v.siteIds.length > 0, {
    message: 'Choose at least one site, or all sites',
    path: ['siteIds'],
  });
export type UserUpdateInput = z.infer<typeof userUpdateSchema>;

export const USER_SORTS = ['name', 'email', 'role', 'lastSignInAt', 'createdAt'] as const;

export const userListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(100).optional(),
  role: z.enum(ROLES).optional(),
  status: z.enum(['active', 'invited', 'expired', 'inactive']).optional(),
  sort: z.enum(USER_SORTS).default('name'),
  dir: z.enum(['asc', 'desc']).default('asc'),
});
export type UserListQuery = z.infer<typeof userListQuerySchema>;

/** `expired`: active, but the access expiry date has passed, so the user cannot sign in. */
export type UserStatus = 'active' | 'invited' | 'expired' | 'inactive';

export interface UserDto {
  id: string;
  email: string;
  name: string;
  role: Role;
  allSites: boolean;
  sites: SiteSummary[];
  accessExpiresOn: string | null;
  status: UserStatus;
  lastSignInAt: string | null;
  createdAt: string;
  abilities: { update: boolean; deactivate: boolean; reactivate: boolean; resendInvite: boolean };
}

export interface AuditEntryDto {
  id: string;
  at: string;
  actorName: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  summary: string;
}
