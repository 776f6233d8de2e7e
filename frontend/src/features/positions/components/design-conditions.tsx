import type { ReactNode } from 'react';
import type { Preferences } from '@shared/schemas/auth.schema';
import type { PositionDto, ReferenceDto } from '@shared/schemas/register.schema';
import { sizeClassByCode } from '@shared/sizes/nominal-sizes';
import { formatLength, formatPressure } from '@shared/units/units';
import { criticalityOf, days, mediumNameOf, NOT_RECORDED, serviceNameOf, sizeOptionLabel, temperatureRange, yesNo } from './position-labels';

function Item({ term, children, wide = false }: { term: string; children: ReactNode; wide?: boolean }) {
  return (
    <div className={wide ? 'sm:col-span-2' : undefined}>
      <dt className="text-sm font-semibold text-ink-600">{term}</dt>
      <dd className="text-lg text-ink-950">{children}</dd>
    </div>
  );
}

const missing = (text: string) => (text === NOT_RECORDED || text === '—' ? <span className="text-ink-600">{NOT_RECORDED}</span> : text);

/** The conditions a hose at this position must meet, in the reader's units. */
export function DesignConditions({ position, reference, units }: { position: PositionDto; reference: ReferenceDto | undefined; units: Preferences }) {
  const size = sizeClassByCode(position.sizeCode);
  const level = criticalityOf(reference, position.criticality);
  const ownInterval = position.inspectionIntervalDays != null;
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-4 sm:grid-cols-2">
      <Item term="Service">{serviceNameOf(reference, position.serviceCode)}</Item>
      <Item term="Medium">{missing(mediumNameOf(reference, position.mediumCode))}</Item>
      <Item term="Maximum operating pressure">
        <span className="font-bold">{missing(formatPressure(position.maxOperatingPressureKpa, units.pressureUnit))}</span>
      </Item>
      <Item term="Temperature range">{missing(temperatureRange(position, units.temperatureUnit))}</Item>
      <Item term="Size">{size ? sizeOptionLabel(size, units.lengthUnit) : position.sizeCode}</Item>
      <Item term="Required length">{missing(formatLength(position.requiredLengthMm, units.lengthUnit))}</Item>
      <Item term="End connections" wide>
        <span className="flex flex-col">
          <span>
            <span className="font-semibold">End A:</span> {position.endAConnection ?? <span className="text-ink-600">{NOT_RECORDED}</span>}
          </span>
          <span>
            <span className="font-semibold">End B:</span> {position.endBConnection ?? <span className="text-ink-600">{NOT_RECORDED}</span>}
          </span>
        </span>
      </Item>
      <Item term="Suction duty">{missing(yesNo(position.suctionDuty))}</Item>
      <Item term="Routed bend radius">{missing(formatLength(position.routedBendRadiusMm, units.lengthUnit))}</Item>
      <Item term="Criticality">
        <span className="flex flex-col">
          <span className="font-semibold">{level?.label ?? position.criticality}</span>
          {level ? <span className="text-base text-ink-700">{level.definition}</span> : null}
        </span>
      </Item>
      <Item term="Inspection interval in force">
        <span className="flex flex-col">
          <span className="font-semibold">Every {days(position.effectiveInspectionIntervalDays)}</span>
          <span className="text-base text-ink-700">
            {ownInterval ? 'Set for this position.' : `The service's interval at this site, adjusted for ${level ? level.label.toLowerCase() : position.criticality} criticality.`}
          </span>
        </span>
      </Item>
      {position.notes ? (
        <Item term="Notes" wide>
          <span className="whitespace-pre-line">{position.notes}</span>
        </Item>
      ) : null}
    </dl>
  );
}
