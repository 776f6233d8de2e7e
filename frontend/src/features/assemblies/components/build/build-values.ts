import type { LengthUnit } from '@shared/units/units';
import type { BuildRequest } from '../../api/build-assembly';
import { measurement, numberOrNull, requiredMeasurement, textOrNull } from '../form-values';

/** The build form as typed: text in the user's units, turned into the request by `buildRequest`. */
export interface BuildValues {
  constructionId: string;
  siteId: string;
  storeLocation: string;
  hoseBatch: string;
  hoseManufacturedOn: string;
  overallLength: string;
  cutLength: string;
  endA: { fittingTypeId: string; crimpDiameter: string };
  endB: { fittingTypeId: string; crimpDiameter: string };
  builtOn: string;
  builtOnEstimated: boolean;
  builder: string;
  cost: string;
  note: string;
}

export const BUILD_FIELDS = [
  'constructionId',
  'siteId',
  'storeLocation',
  'hoseBatch',
  'hoseManufacturedOn',
  'overallLength',
  'cutLength',
  'endA.fittingTypeId',
  'endA.crimpDiameter',
  'endB.fittingTypeId',
  'endB.crimpDiameter',
  'builtOn',
  'builtOnEstimated',
  'builder',
  'cost',
  'note',
] as const;

function end(values: BuildValues['endA'], unit: LengthUnit) {
  return values.fittingTypeId ? { fittingTypeId: values.fittingTypeId, crimpDiameter: measurement(values.crimpDiameter, unit) } : null;
}

export function buildRequest(v: BuildValues, unit: LengthUnit): BuildRequest {
  return {
    constructionId: v.constructionId,
    siteId: v.siteId,
    storeLocation: textOrNull(v.storeLocation),
    hoseBatch: textOrNull(v.hoseBatch),
    hoseManufacturedOn: textOrNull(v.hoseManufacturedOn),
    overallLength: requiredMeasurement(v.overallLength, unit) as BuildRequest['overallLength'],
    cutLength: measurement(v.cutLength, unit),
    endA: end(v.endA, unit),
    endB: end(v.endB, unit),
    builtOn: v.builtOn,
    builtOnEstimated: v.builtOnEstimated,
    builder: textOrNull(v.builder),
    cost: numberOrNull(v.cost),
    note: textOrNull(v.note),
  };
}
