// Why an assembly came out of its position, and whether that ends its life as a failure or
// leaves it as a suspension (right-censored) in the life data. A plant may change the mapping.

export const REMOVAL_REASONS = [
  'failure',
  'damaged',
  'worn-at-inspection',
  'planned-replacement',
  'relocated',
  'obsolete',
] as const;
export type RemovalReason = (typeof REMOVAL_REASONS)[number];

export const LIFE_OUTCOMES = ['failure', 'suspension'] as const;
export type LifeOutcome = (typeof LIFE_OUTCOMES)[number];

export interface RemovalReasonDefinition {
  code: RemovalReason;
  label: string;
  description: string;
  /** How a removal for this reason counts in life data unless the plant says otherwise. */
  defaultLifeOutcome: LifeOutcome;
}

/** Source of the default mapping: worn or damaged at inspection ends a life, a planned removal is a suspension. */
export const REMOVAL_MAPPING_SOURCE = 'Ferrule design, life data (usual reliability-data practice, ISO 14224)';

/** The removal reasons with their default life outcome. */
export const REMOVAL_REASON_DEFINITIONS: readonly RemovalReasonDefinition[] = [
  {
    code: 'failure',
    label: 'Failure',
    description: 'The hose or a fitting failed in service: burst, leak, pull-out or collapse.',
    defaultLifeOutcome: 'failure',
  },
  {
    code: 'damaged',
    label: 'Damaged',
    description: 'Cut, crushed, kinked or otherwise damaged so that it must not stay in service.',
    defaultLifeOutcome: 'failure',
  },
  {
    code: 'worn-at-inspection',
    label: 'Worn at inspection',
    description: 'An inspection found wear that takes it out of service, such as reinforcement showing.',
    defaultLifeOutcome: 'failure',
  },
  {
    code: 'planned-replacement',
    label: 'Planned replacement',
    description: 'Replaced on schedule while still serviceable.',
    defaultLifeOutcome: 'suspension',
  },
  {
    code: 'relocated',
    label: 'Relocated',
    description: 'Moved to another position or back to stock while still serviceable.',
    defaultLifeOutcome: 'suspension',
  },
  {
    code: 'obsolete',
    label: 'Obsolete',
    description: 'The equipment or the position no longer needs it.',
    defaultLifeOutcome: 'suspension',
  },
];

/** The definition of a removal reason. */
export function removalReason(code: RemovalReason): RemovalReasonDefinition {
  const found = REMOVAL_REASON_DEFINITIONS.find((r) => r.code === code);
  if (!found) throw new Error(`Unknown removal reason: ${code}`);
  return found;
}

/** Whether a removal for this reason ends a life ('failure') or censors it ('suspension'), by default. */
export function defaultLifeOutcome(code: RemovalReason): LifeOutcome {
  return removalReason(code).defaultLifeOutcome;
}

export function isRemovalReason(value: unknown): value is RemovalReason {
  return typeof value === 'string' && (REMOVAL_REASONS as readonly string[]).includes(value);
}
