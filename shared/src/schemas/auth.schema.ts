import { z } from 'zod';
import { emailSchema } from './common.schema.js';
import type { Role } from '../roles.js';
import { passwordProblem } from '../passwords.js';

export { PASSWORD_MIN_LENGTH } from '../passwords.js';

export const passwordSchema = z
  .string({ message: 'Password is required' })
  .superRefine((value, ctx) => {
    const problem = passwordProblem(value);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });

export const signInSchema = z.strictObject({
  email: emailSchema,
  password: z.string({ message: 'Password is required' }).min(1, 'Password is required').max(1024),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const resetRequestSchema = z.strictObject({ email: emailSchema });
export type ResetRequestInput = z.infer<typeof resetRequestSchema>;

export const tokenPasswordSchema = z.strictObject({
  token: z.string({ message: 'The link is incomplete' }).min(20, 'The link is incomplete').max(200),
  password: passwordSchema,
});
export type TokenPasswordInput = z.infer<typeof tokenPasswordSchema>;

export const setupSchema = z.strictObject({
  token: z.string().min(20, 'The set-up token is incomplete').max(200),
  email: emailSchema,
  name: z.string().trim().min(1, 'Name is required').max(120),
  password: passwordSchema,
});
export type SetupInput = z.infer<typeof setupSchema>;

export const PRESSURE_UNITS = ['kPa', 'bar', 'psi'] as const;
export const LENGTH_UNITS = ['mm', 'in'] as const;
export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type LengthUnit = (typeof LENGTH_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

export const preferencesSchema = z.strictObject({
  pressureUnit: z.enum(PRESSURE_UNITS, { message: 'Choose kPa, bar or psi' }),
  lengthUnit: z.enum(LENGTH_UNITS, { message: 'Choose mm or in' }),
  temperatureUnit: z.enum(TEMPERATURE_UNITS, { message: 'Choose °C or °F' }),
});
export type Preferences = z.infer<typeof preferencesSchema>;
export const DEFAULT_PREFERENCES: Preferences = { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' };

export interface SiteSummary {
  id: string;
  code: string;
  name: string;
}

/** The signed-in user as the client sees them. `abilities` lists the actions their role may take. */
export interface MeDto {
  id: string;
  email: string;
  name: string;
  role: Role;
  allSites: boolean;
  sites: SiteSummary[];
  accessExpiresOn: string | null;
  preferences: Preferences;
  abilities: string[];
}

export interface AppMetaDto {
  mode: 'demo' | 'production';
  needsSetup: boolean;
  companyName: string | null;
}
