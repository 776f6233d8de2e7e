import { TUBE_COMPOUND_NAMES, type TubeCompound } from '@shared/checks/compatibility';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { sizeClassByCode, sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatLength, formatPressure, formatTemperature } from '@shared/units/units';
import { useUnits } from '../hooks/use-units';
import { ELECTRICAL_LABELS, labelOf, months, REINFORCEMENT_LABELS } from '../utils/labels';
import { formatWeight } from '../utils/quantities';
import { PropertyList, type Property } from './property-list';

const orNull = <T,>(value: T | null, show: (v: T) => string): string | null => (value == null ? null : show(value));

/** Every property of a construction, in the reader's units, in the groups a fitter looks for them. */
export function ConstructionProperties({ construction: c }: { construction: ConstructionDto }) {
  const units = useUnits();
  const size = sizeClassByCode(c.sizeCode);
  const ratio = c.workingPressureKpa && c.burstPressureKpa ? c.burstPressureKpa / c.workingPressureKpa : null;
  const compoundName = c.tubeCompound ? TUBE_COMPOUND_NAMES[c.tubeCompound as TubeCompound] : undefined;

  const build: Property[] = [
    {
      label: 'Nominal size',
      value: sizeLabel(c.sizeCode, units.lengthUnit),
      note: size ? `${size.nominalBoreMm} mm · ${size.inch} in · −${size.dash}` : undefined,
    },
    { label: 'Tube compound', value: c.tubeCompound, note: compoundName ? `${compoundName[0]!.toUpperCase()}${compoundName.slice(1)}` : undefined },
    { label: 'Reinforcement', value: labelOf(REINFORCEMENT_LABELS, c.reinforcement) },
    { label: 'Cover compound', value: c.coverCompound },
  ];
  const ratings: Property[] = [
    { label: 'Working pressure', value: orNull(c.workingPressureKpa, (v) => formatPressure(v, units.pressureUnit)) },
    {
      label: 'Burst pressure',
      value: orNull(c.burstPressureKpa, (v) => formatPressure(v, units.pressureUnit)),
      note: ratio ? `${ratio.toFixed(1)} : 1 burst to working` : undefined,
    },
    {
      label: 'Vacuum rating',
      value: orNull(c.vacuumRatingKpa, (v) => `${formatPressure(v, units.pressureUnit)} below atmospheric`),
      note: c.vacuumRatingKpa == null ? 'Not rated for suction duty' : undefined,
    },
    { label: 'Lowest temperature', value: orNull(c.minTempC, (v) => formatTemperature(v, units.temperatureUnit)) },
    { label: 'Highest temperature', value: orNull(c.maxTempC, (v) => formatTemperature(v, units.temperatureUnit)) },
    { label: 'Minimum bend radius', value: orNull(c.minBendRadiusMm, (v) => formatLength(v, units.lengthUnit)) },
    { label: 'Weight', value: orNull(c.weightKgPerM, (v) => formatWeight(v, units.lengthUnit)) },
  ];
  const fitness: Property[] = [
    { label: 'Electrical property', value: labelOf(ELECTRICAL_LABELS, c.electrical) },
    {
      label: 'Food contact',
      value: c.foodContactCertified == null ? null : c.foodContactCertified ? 'Certified for food contact' : 'Not certified for food contact',
    },
  ];
  const life: Property[] = [
    { label: 'Service life', value: orNull(c.serviceLifeMonths, months), note: c.serviceLifeMonths ? 'From the build date, storage included' : undefined },
    { label: 'Shelf life', value: orNull(c.shelfLifeMonths, months), note: c.shelfLifeMonths ? 'Oldest the bulk hose may be when assembled' : undefined },
    { label: 'Storage life', value: orNull(c.storageLifeMonths, months), note: c.storageLifeMonths ? 'Longest in stock between build and install' : undefined },
  ];
  const maker: Property[] = [
    { label: 'Maker', value: c.maker },
    { label: 'Part number', value: c.partNumber ? <span className="font-mono">{c.partNumber}</span> : null },
  ];

  return (
    <div className="flex flex-col gap-6">
      <PropertyGroup title="Build" items={build} />
      <PropertyGroup title="Ratings" items={ratings} />
      <PropertyGroup title="Electrical and food contact" items={fitness} />
      <PropertyGroup title="Life limits" items={life} />
      <PropertyGroup title="Maker" items={maker} />
      {c.notes ? (
        <section className="flex flex-col gap-1">
          <h3 className="font-bold text-ink-950">Notes</h3>
          <p className="whitespace-pre-line text-ink-900">{c.notes}</p>
        </section>
      ) : null}
    </div>
  );
}

function PropertyGroup({ title, items }: { title: string; items: Property[] }) {
  return (
    <section className="flex flex-col gap-2">
      <h3 className="font-bold text-ink-950">{title}</h3>
      <PropertyList items={items} label={title} />
    </section>
  );
}
