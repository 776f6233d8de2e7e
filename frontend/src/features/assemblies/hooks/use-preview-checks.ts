import { useQueries, useQuery } from '@tanstack/react-query';
import { runSelectionChecks, type SelectionCheckSummary } from '@shared/checks/selection-checks';
import type { ElectricalProperty, FittingCheckInput, Reinforcement, SelectionCheckInput } from '@shared/checks/types';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import type { ConstructionDto, FittingTypeDto, PositionDto, SiteServiceDto } from '@shared/schemas/register.schema';
import { defaultServiceSettings, serviceByCode } from '@shared/services/service-catalogue';
import { useCurrentUser } from '@/lib/auth';
import { constructionQueryOptions } from '../api/get-construction';
import { fittingTypeQueryOptions } from '../api/get-fitting-type';
import { positionQueryOptions } from '../api/get-position';
import { siteServicesQueryOptions } from '../api/get-site-services';

export type PreviewChecks = { state: 'pending' } | { state: 'unavailable'; error: unknown } | { state: 'ready'; summary: SelectionCheckSummary };

function fittingInput(fitting: FittingTypeDto | null | undefined, hoseSizeCode: string): FittingCheckInput | null {
  if (!fitting) return null;
  const size = fitting.sizes.find((s) => s.sizeCode === hoseSizeCode);
  return size ? { sizeCode: size.sizeCode, ratingKpa: size.ratingKpa } : { sizeCode: fitting.sizes[0]?.sizeCode ?? null, ratingKpa: null };
}

/** The inputs of the selection checks as the server builds them, from the records the client can read. */
export function previewInput(
  assembly: AssemblyDto,
  construction: ConstructionDto,
  fittings: { endA: FittingTypeDto | null; endB: FittingTypeDto | null },
  position: PositionDto,
  service: SiteServiceDto | null,
  now: Date,
): SelectionCheckInput {
  const fallback = serviceByCode(position.serviceCode);
  return {
    construction: {
      code: construction.code,
      tubeCompound: construction.tubeCompound,
      reinforcement: construction.reinforcement as Reinforcement | null,
      coverCompound: construction.coverCompound,
      sizeCode: construction.sizeCode,
      workingPressureKpa: construction.workingPressureKpa,
      burstPressureKpa: construction.burstPressureKpa,
      vacuumRatingKpa: construction.vacuumRatingKpa,
      minTempC: construction.minTempC,
      maxTempC: construction.maxTempC,
      minBendRadiusMm: construction.minBendRadiusMm,
      electrical: construction.electrical as ElectricalProperty | null,
      foodContactCertified: construction.foodContactCertified,
      serviceLifeMonths: construction.serviceLifeMonths,
      shelfLifeMonths: construction.shelfLifeMonths,
      storageLifeMonths: construction.storageLifeMonths,
    },
    fittings: { endA: fittingInput(fittings.endA, construction.sizeCode), endB: fittingInput(fittings.endB, construction.sizeCode) },
    position: {
      serviceCode: position.serviceCode,
      mediumCode: position.mediumCode,
      maxOperatingPressureKpa: position.maxOperatingPressureKpa,
      minTempC: position.minTempC,
      maxTempC: position.maxTempC,
      sizeCode: position.sizeCode,
      suctionDuty: position.suctionDuty,
      routedBendRadiusMm: position.routedBendRadiusMm,
    },
    service: service ? service.settings : fallback ? defaultServiceSettings(fallback) : null,
    assembly: {
      hoseManufacturedOn: assembly.hoseManufacturedOn,
      builtOn: assembly.builtOn,
      installedOn: now.toISOString(),
      proofTest: assembly.proofTest
        ? { result: assembly.proofTest.result, heldPressureKpa: assembly.proofTest.heldPressureKpa, requiredPressureKpa: assembly.proofTest.requiredPressureKpa }
        : null,
    },
  };
}

/**
 * The selection checks of an assembly at a position, worked out on this device with the same
 * shared checks the server runs, in the user's units. The server checks again when the work is
 * confirmed; its answer decides.
 */
export function usePreviewChecks(assembly: AssemblyDto | undefined, positionId: string | null | undefined): PreviewChecks {
  const { preferences } = useCurrentUser();
  const construction = useQuery(constructionQueryOptions(assembly?.construction.id));
  // Both ends are often the same fitting type: ask for each type once.
  const fittingIds = [...new Set([assembly?.endA?.fittingTypeId, assembly?.endB?.fittingTypeId].filter((id): id is string => Boolean(id)))];
  const fittingQueries = useQueries({ queries: fittingIds.map((id) => fittingTypeQueryOptions(id)) });
  const fittingOf = (id: string | undefined) => (id ? fittingQueries[fittingIds.indexOf(id)] : undefined);
  const endA = fittingOf(assembly?.endA?.fittingTypeId);
  const endB = fittingOf(assembly?.endB?.fittingTypeId);
  const position = useQuery(positionQueryOptions(positionId));
  const services = useQuery(siteServicesQueryOptions(position.data?.siteId));

  const failed = [construction, ...fittingQueries, position, services].find((q) => q.isError);
  if (failed) return { state: 'unavailable', error: failed.error };
  if (!assembly || !construction.data || !position.data || !services.data) return { state: 'pending' };
  if ((assembly.endA && !endA?.data) || (assembly.endB && !endB?.data)) return { state: 'pending' };

  const now = new Date();
  const service = services.data.find((s) => s.serviceCode === position.data.serviceCode) ?? null;
  const input = previewInput(assembly, construction.data, { endA: endA?.data ?? null, endB: endB?.data ?? null }, position.data, service, now);
  return {
    state: 'ready',
    summary: runSelectionChecks(input, { now, pressureUnit: preferences.pressureUnit, lengthUnit: preferences.lengthUnit, temperatureUnit: preferences.temperatureUnit }),
  };
}
