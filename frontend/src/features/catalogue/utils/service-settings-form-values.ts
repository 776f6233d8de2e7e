import type { Preferences } from '@shared/schemas/auth.schema';
import type { ServiceSettingsInput } from '@shared/schemas/register.schema';
import { toKpa } from '@shared/units/units';
import { fieldText, parseDecimal, parseWhole, pressureFieldText } from './quantities';

export interface DesignFactorBandFormValues {
  /** The top of the band in the reader's pressure unit; the last band has none. */
  upTo: string;
  factor: string;
  source: string;
}

/** A service's settings at a site, as typed in the form. */
export interface ServiceSettingsFormValues {
  designFactorBands: DesignFactorBandFormValues[];
  defaultInspectionIntervalDays: string;
  conductivityRequired: string;
  periodicTest: { kind: '' | 'pressure' | 'continuity'; intervalDays: string };
  suctionDuty: boolean;
  foodContactRequired: boolean;
}

export const SERVICE_SETTINGS_FIELDS = ['designFactorBands', 'defaultInspectionIntervalDays', 'conductivityRequired', 'periodicTest', 'suctionDuty', 'foodContactRequired'] as const;
export const SERVICE_SETTINGS_RENAMES = { upToKpa: 'upTo' };
export const SERVICE_SETTINGS_LABELS: Record<string, string> = {
  'designFactorBands.*.upTo': 'Up to',
  'designFactorBands.*.factor': 'Design factor',
  'designFactorBands.*.source': 'Source',
  defaultInspectionIntervalDays: 'Inspection interval',
  'periodicTest.intervalDays': 'Test interval',
};

export function serviceSettingsFormValues(s: ServiceSettingsInput, units: Preferences): ServiceSettingsFormValues {
  return {
    designFactorBands: s.designFactorBands.map((b) => ({ upTo: pressureFieldText(b.upToKpa, units.pressureUnit), factor: fieldText(b.factor), source: b.source })),
    defaultInspectionIntervalDays: String(s.defaultInspectionIntervalDays),
    conductivityRequired: s.conductivityRequired,
    periodicTest: s.periodicTest ? { kind: s.periodicTest.kind, intervalDays: String(s.periodicTest.intervalDays) } : { kind: '', intervalDays: '' },
    suctionDuty: s.suctionDuty,
    foodContactRequired: s.foodContactRequired,
  };
}

/**
 * The settings the typed values make. The last band is always open-ended. A band's top left as it
 * was shown keeps its stored kPa value exactly, so saving does not turn the defaults into a
 * near-copy that reads as customised.
 */
export function serviceSettingsInput(v: ServiceSettingsFormValues, units: Preferences, current: ServiceSettingsInput): ServiceSettingsInput {
  const last = v.designFactorBands.length - 1;
  return {
    designFactorBands: v.designFactorBands.map((band, index) => {
      let upToKpa: number | null = null;
      if (index !== last) {
        const was = current.designFactorBands[index]?.upToKpa;
        if (was != null && band.upTo.trim() === pressureFieldText(was, units.pressureUnit)) upToKpa = was;
        else {
          const typed = parseDecimal(band.upTo);
          upToKpa = typed == null ? Number.NaN : toKpa(typed, units.pressureUnit);
        }
      }
      const factor = parseDecimal(band.factor);
      return { upToKpa, factor: factor ?? Number.NaN, source: band.source };
    }),
    defaultInspectionIntervalDays: parseWhole(v.defaultInspectionIntervalDays) ?? Number.NaN,
    conductivityRequired: v.conductivityRequired as ServiceSettingsInput['conductivityRequired'],
    periodicTest: v.periodicTest.kind === '' ? null : { kind: v.periodicTest.kind, intervalDays: parseWhole(v.periodicTest.intervalDays) ?? Number.NaN },
    suctionDuty: v.suctionDuty,
    foodContactRequired: v.foodContactRequired,
  };
}
