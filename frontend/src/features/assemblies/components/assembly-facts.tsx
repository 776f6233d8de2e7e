import { FITTING_STYLE_LABELS, type FittingStyle } from '@shared/schemas/register.schema';
import type { AssemblyDto, FittingEndDto } from '@shared/schemas/assemblies.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatLength, formatPressure } from '@shared/units/units';
import type { Preferences } from '@shared/schemas/auth.schema';
import { formatDate } from '@/lib/format';
import { Badge } from '@/components/ui/badge';
import { Fact, FactList, NotRecorded } from './fact-list';

function money(amount: number, currency: string | undefined): string {
  if (!currency) return amount.toLocaleString(undefined, { minimumFractionDigits: 2, maximumFractionDigits: 2 });
  try {
    return amount.toLocaleString(undefined, { style: 'currency', currency });
  } catch {
    return `${amount.toFixed(2)} ${currency}`;
  }
}

function CrimpLine({ end, units }: { end: FittingEndDto; units: Preferences }) {
  const spec =
    end.specifiedCrimpDiameterMm != null
      ? `specified ${formatLength(end.specifiedCrimpDiameterMm, units.lengthUnit)}${end.crimpToleranceMm != null ? ` ± ${formatLength(end.crimpToleranceMm, units.lengthUnit)}` : ''}`
      : 'no specification at this size';
  if (end.crimpDiameterMm == null) {
    return (
      <span>
        <NotRecorded>Crimp not measured</NotRecorded> <span className="text-ink-600">({spec})</span>
      </span>
    );
  }
  return (
    <span className="flex flex-wrap items-center gap-x-2 gap-y-1">
      <span>
        Crimp measured {formatLength(end.crimpDiameterMm, units.lengthUnit)}, {spec}
      </span>
      {end.crimpWithinSpec === true ? <Badge tone="success">Within specification</Badge> : null}
      {end.crimpWithinSpec === false ? <Badge tone="danger">Outside specification</Badge> : null}
    </span>
  );
}

function FittingEnd({ label, end, units }: { label: string; end: FittingEndDto | null; units: Preferences }) {
  return (
    <Fact label={label} wide>
      {end ? (
        <span className="flex flex-col gap-0.5">
          <span>
            <span className="font-mono font-semibold">{end.code}</span> {end.name}
          </span>
          <span className="text-ink-700">
            {FITTING_STYLE_LABELS[end.style as FittingStyle] ?? end.style} · {end.ratingKpa != null ? `rated ${formatPressure(end.ratingKpa, units.pressureUnit)}` : 'no rating at this size'}
          </span>
          <CrimpLine end={end} units={units} />
        </span>
      ) : (
        <NotRecorded>No fitting recorded</NotRecorded>
      )}
    </Fact>
  );
}

/** What the assembly is: its hose, lengths, fittings, batch, build and rating, in the viewer's units. */
export function AssemblyFacts({ assembly, units, currency }: { assembly: AssemblyDto; units: Preferences; currency?: string }) {
  const a = assembly;
  return (
    <FactList>
      <Fact label="Construction" wide>
        <span className="font-mono font-semibold">{a.construction.code}</span> {a.construction.name}
      </Fact>
      <Fact label="Size">{sizeLabel(a.construction.sizeCode, units.lengthUnit)}</Fact>
      <Fact label="Allowable pressure">
        {a.allowablePressureKpa != null ? (
          <span className="font-bold">{formatPressure(a.allowablePressureKpa, units.pressureUnit)}</span>
        ) : (
          <NotRecorded>Not known: a rating is missing</NotRecorded>
        )}
      </Fact>
      <Fact label="Overall length">{a.overallLengthMm != null ? formatLength(a.overallLengthMm, units.lengthUnit) : <NotRecorded />}</Fact>
      <Fact label="Cut length">{a.cutLengthMm != null ? formatLength(a.cutLengthMm, units.lengthUnit) : <NotRecorded />}</Fact>
      <FittingEnd label="End A" end={a.endA} units={units} />
      <FittingEnd label="End B" end={a.endB} units={units} />
      <Fact label="Hose batch">{a.hoseBatch ?? <NotRecorded />}</Fact>
      <Fact label="Hose made on">{a.hoseManufacturedOn ? formatDate(a.hoseManufacturedOn) : <NotRecorded />}</Fact>
      <Fact label="Built on">
        {a.builtOn ? (
          <>
            {formatDate(a.builtOn)}
            {a.builtOnEstimated ? <span className="text-ink-600"> (estimated)</span> : null}
          </>
        ) : (
          <NotRecorded />
        )}
      </Fact>
      <Fact label="Built by">{a.builder ?? <NotRecorded />}</Fact>
      <Fact label="Cost">{a.cost != null ? money(a.cost, currency) : <NotRecorded />}</Fact>
      {a.predatesRecords ? (
        <Fact label="Records">Installed before records began: its true age is not known.</Fact>
      ) : null}
      {a.notes ? (
        <Fact label="Notes" wide>
          <span className="whitespace-pre-line">{a.notes}</span>
        </Fact>
      ) : null}
    </FactList>
  );
}
