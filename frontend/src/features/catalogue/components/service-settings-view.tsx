import type { ServiceSettingsInput, SiteServiceDto } from '@shared/schemas/register.schema';
import type { ServiceDefinition } from '@shared/services/service-catalogue';
import { formatPressure } from '@shared/units/units';
import { TBody, Td, Th, THead, Table, Tr } from '@/components/ui/table';
import { useUnits } from '../hooks/use-units';
import { CONDUCTIVITY_LABELS, days, labelOf, PERIODIC_TEST_LABELS, sentenceCase } from '../utils/labels';
import { PropertyList, type Property } from './property-list';

type Bands = ServiceSettingsInput['designFactorBands'];

/** "Up to 10.3 bar", "Above 10.3 bar", "Any pressure". */
export function bandRange(bands: Bands, index: number, pressureUnit: Parameters<typeof formatPressure>[1]): string {
  const band = bands[index]!;
  if (band.upToKpa != null) return `Up to ${formatPressure(band.upToKpa, pressureUnit)}`;
  const below = bands[index - 1]?.upToKpa;
  return below == null ? 'Any pressure' : `Above ${formatPressure(below, pressureUnit)}`;
}

export const factorText = (factor: number) => `${Number(factor.toPrecision(4))} : 1`;

export function periodicTestText(test: ServiceSettingsInput['periodicTest']): string {
  return test ? `${labelOf(PERIODIC_TEST_LABELS, test.kind)} every ${days(test.intervalDays)}` : 'No periodic test';
}

const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** One service's settings at a site, each with where it comes from, and the catalogue default beside any that differ. */
export function ServiceSettingsView({ service, definition }: { service: SiteServiceDto; definition: ServiceDefinition | undefined }) {
  const { settings, defaults } = service;
  const bandsChanged = !sameJson(settings.designFactorBands, defaults.designFactorBands);
  const defaultNote = (changed: boolean, text: string) => (changed ? <span className="font-semibold text-copper-800">Catalogue default: {text}</span> : null);
  const sourceNote = (source: string | undefined) => (source ? <span className="text-ink-700">Source: {sentenceCase(source)}</span> : null);
  const both = (changed: boolean, defaultText: string, source: string | undefined) =>
    changed ? (
      <span className="flex flex-col">
        {defaultNote(true, defaultText)}
        {sourceNote(source ? `${source} (for the default)` : undefined)}
      </span>
    ) : (
      sourceNote(source)
    );

  const properties: Property[] = [
    {
      label: 'Inspection interval',
      value: `Every ${days(settings.defaultInspectionIntervalDays)}`,
      note: both(settings.defaultInspectionIntervalDays !== defaults.defaultInspectionIntervalDays, `every ${days(defaults.defaultInspectionIntervalDays)}`, definition?.sources.inspectionInterval),
    },
    {
      label: 'Conductivity',
      value: labelOf(CONDUCTIVITY_LABELS, settings.conductivityRequired),
      note: both(settings.conductivityRequired !== defaults.conductivityRequired, labelOf(CONDUCTIVITY_LABELS, defaults.conductivityRequired) ?? '', definition?.sources.conductivity),
    },
    {
      label: 'Periodic test',
      value: periodicTestText(settings.periodicTest),
      note: both(!sameJson(settings.periodicTest, defaults.periodicTest), periodicTestText(defaults.periodicTest).toLowerCase(), definition?.sources.periodicTest),
    },
    {
      label: 'Suction duty',
      value: settings.suctionDuty ? 'Yes: the hose must be rated for vacuum' : 'No',
      note: defaultNote(settings.suctionDuty !== defaults.suctionDuty, defaults.suctionDuty ? 'yes' : 'no'),
    },
    {
      label: 'Food contact',
      value: settings.foodContactRequired ? 'Required: food-contact certified tube' : 'Not required',
      note: defaultNote(settings.foodContactRequired !== defaults.foodContactRequired, defaults.foodContactRequired ? 'required' : 'not required'),
    },
  ];

  return (
    <div className="flex flex-col gap-5">
      <section className="flex flex-col gap-2">
        <h4 className="font-bold text-ink-950">Design factor by pressure</h4>
        <p className="text-sm text-ink-700">Minimum burst pressure ÷ maximum working pressure. An assembly is allowed its burst pressure divided by this factor.</p>
        <BandsTable bands={settings.designFactorBands} caption={`Design factors of ${service.name}`} />
        {bandsChanged ? (
          <div className="flex flex-col gap-2">
            <p className="text-sm font-semibold text-copper-800">The catalogue's defaults, which this site has changed:</p>
            <BandsTable bands={defaults.designFactorBands} caption={`Default design factors of ${service.name}`} />
          </div>
        ) : null}
      </section>
      <PropertyList items={properties} label={`Other settings of ${service.name}`} />
    </div>
  );
}

function BandsTable({ bands, caption }: { bands: Bands; caption: string }) {
  const { pressureUnit } = useUnits();
  return (
    <>
      <div className="hidden sm:block">
        <Table aria-label={caption}>
          <THead>
            <tr>
              <Th>Pressure</Th>
              <Th>Factor</Th>
              <Th>Source</Th>
            </tr>
          </THead>
          <TBody>
            {bands.map((band, index) => (
              <Tr key={index}>
                <Td className="whitespace-nowrap">{bandRange(bands, index, pressureUnit)}</Td>
                <Td className="font-semibold whitespace-nowrap tabular-nums">{factorText(band.factor)}</Td>
                <Td className="text-sm">{sentenceCase(band.source)}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </div>
      <ul className="flex flex-col gap-2 sm:hidden" aria-label={caption}>
        {bands.map((band, index) => (
          <li key={index} className="rounded-[var(--radius-control)] border border-ink-200 bg-white px-3 py-2">
            <div className="flex items-baseline justify-between gap-3">
              <span className="text-ink-900">{bandRange(bands, index, pressureUnit)}</span>
              <span className="font-bold text-ink-950 tabular-nums">{factorText(band.factor)}</span>
            </div>
            <p className="text-sm text-ink-700">{sentenceCase(band.source)}</p>
          </li>
        ))}
      </ul>
    </>
  );
}
