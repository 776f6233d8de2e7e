// How much a position's failure matters, and how that shortens or lengthens the service's
// inspection interval there. The scale and its factors are common practice (risk-based
// inspection: frequency by the severity of the application and risk potential, SAE J1273).

export const CRITICALITY_LEVELS = ['high', 'medium', 'low'] as const;
export type Criticality = (typeof CRITICALITY_LEVELS)[number];

export interface CriticalityDefinition {
  code: Criticality;
  label: string;
  definition: string;
  /** Multiplies the service's inspection interval at a position of this level. */
  inspectionIntervalFactor: number;
  source: string;
}

const SOURCE = 'common practice; inspection frequency by severity and risk potential (SAE J1273)';

export const CRITICALITY_DEFINITIONS: readonly CriticalityDefinition[] = [
  {
    code: 'high',
    label: 'High',
    definition: 'A failure here could injure someone, release a hazardous medium or stop the plant.',
    inspectionIntervalFactor: 0.5,
    source: SOURCE,
  },
  {
    code: 'medium',
    label: 'Medium',
    definition: 'A failure here stops one machine or costs production, with no one in the line of fire.',
    inspectionIntervalFactor: 1,
    source: SOURCE,
  },
  {
    code: 'low',
    label: 'Low',
    definition: 'A failure here is a nuisance: a spare or another line takes over and nothing hazardous escapes.',
    inspectionIntervalFactor: 1.5,
    source: SOURCE,
  },
];

export function criticality(code: Criticality): CriticalityDefinition {
  const found = CRITICALITY_DEFINITIONS.find((c) => c.code === code);
  if (!found) throw new Error(`Unknown criticality: ${code}`);
  return found;
}

/** The inspection interval at a position, whole days (at least 1): the service's interval times the level's factor. */
export function inspectionIntervalDays(serviceIntervalDays: number, level: Criticality): number {
  return Math.max(1, Math.round(serviceIntervalDays * criticality(level).inspectionIntervalFactor));
}

export function isCriticality(value: unknown): value is Criticality {
  return typeof value === 'string' && (CRITICALITY_LEVELS as readonly string[]).includes(value);
}
