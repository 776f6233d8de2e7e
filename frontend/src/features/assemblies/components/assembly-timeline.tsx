import { useState } from 'react';
import type { AssemblyEventDto } from '@shared/schemas/assemblies.schema';
import type { Preferences } from '@shared/schemas/auth.schema';
import { formatPressure } from '@shared/units/units';
import { formatDate, formatDateTime } from '@/lib/format';
import { cn } from '@/lib/cn';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { holdTime } from './proof-test-summary';
import { checkLabel, EVENT_KIND_LABELS, LIFE_OUTCOME_LABELS, PROOF_TEST_MEDIUM_LABELS, removalReasonLabel } from './labels';
import { VoidEventSheet } from './void-event-sheet';

/** Kinds a correction may void; moves are put right by the next move. */
export const VOIDABLE_KINDS = new Set(['proof_test', 'inspection', 'note']);

const DAY_ONLY_KINDS = new Set(['build', 'proof_test']);

const str = (v: unknown) => (typeof v === 'string' ? v : null);
const num = (v: unknown) => (typeof v === 'number' ? v : null);

/** What one event's data says, in a line or two. */
function EventDetail({ event, units }: { event: AssemblyEventDto; units: Preferences }) {
  const d = event.data;
  switch (event.kind) {
    case 'proof_test': {
      const held = num(d.heldPressureKpa);
      const required = num(d.requiredPressureKpa);
      const seconds = num(d.holdSeconds);
      const medium = str(d.medium);
      return (
        <p>
          <span className="font-semibold">{d.result === 'pass' ? 'Passed' : 'Failed'}</span>: held {formatPressure(held, units.pressureUnit)}
          {seconds ? ` for ${holdTime(seconds)}` : ''} (required {formatPressure(required, units.pressureUnit)}), with{' '}
          {medium ? (PROOF_TEST_MEDIUM_LABELS[medium as keyof typeof PROOF_TEST_MEDIUM_LABELS] ?? medium).toLowerCase() : 'a liquid'}
          {str(d.tester) ? `, by ${str(d.tester)}` : ''}.
        </p>
      );
    }
    case 'install':
      return (
        <p>
          At {event.positionCode ?? 'a position'}
          {str(d.checkOutcome) ? `; selection checks: ${str(d.checkOutcome) === 'warn' ? 'warning' : str(d.checkOutcome)}` : ''}
          {d.crossSite ? '; brought from another site' : ''}.
        </p>
      );
    case 'remove': {
      const outcome = str(d.lifeOutcome);
      return (
        <p>
          From {event.positionCode ?? 'its position'}: <span className="font-semibold">{removalReasonLabel(str(d.reason))}</span>
          {outcome ? `, ${LIFE_OUTCOME_LABELS[outcome] ?? outcome}` : ''}.
        </p>
      );
    }
    case 'override': {
      const checks = Array.isArray(d.checks) ? (d.checks as string[]) : [];
      return (
        <p>
          Accepted {checks.map(checkLabel).join(', ') || 'failed checks'}
          {str(d.reviewOn) ? `, to be reviewed by ${formatDate(str(d.reviewOn)!)}` : ''}.
        </p>
      );
    }
    case 'void':
      return <p>Voided an earlier {EVENT_KIND_LABELS[(str(d.voidedKind) ?? 'note') as keyof typeof EVENT_KIND_LABELS]?.toLowerCase() ?? 'record'}.</p>;
    case 'return_to_stock':
      return d.crossSite ? <p>Moved into the store of another site.</p> : null;
    default:
      return null;
  }
}

function TimelineItem({ event, units, canVoid, onVoid }: { event: AssemblyEventDto; units: Preferences; canVoid: boolean; onVoid: () => void }) {
  const voided = event.voidedBy;
  // Builds and proof tests are recorded by the day; their time of day means nothing.
  const dayOnly = DAY_ONLY_KINDS.has(event.kind);
  const late = dayOnly
    ? event.recordedAt.slice(0, 10) !== event.occurredAt.slice(0, 10)
    : Math.abs(Date.parse(event.recordedAt) - Date.parse(event.occurredAt)) > 6 * 3_600_000;
  return (
    <li className="relative flex flex-col gap-1 border-l-4 border-ink-200 pb-5 pl-5 last:pb-0">
      <span aria-hidden="true" className={cn('absolute top-1.5 -left-[0.6rem] size-4 rounded-full border-4 border-white', voided ? 'bg-ink-300' : 'bg-copper-700')} />
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <h3 className={cn('text-lg font-bold text-ink-950', voided && 'text-ink-600 line-through')}>{EVENT_KIND_LABELS[event.kind] ?? event.kind}</h3>
        {voided ? <Badge tone="muted">Voided</Badge> : null}
        <span className="text-ink-700">
          <time dateTime={dayOnly ? event.occurredAt.slice(0, 10) : event.occurredAt}>{dayOnly ? formatDate(event.occurredAt) : formatDateTime(event.occurredAt)}</time>
          {event.occurredAtEstimated ? ' (estimated)' : ''}
        </span>
      </div>
      <div className={cn('flex flex-col gap-1 text-ink-900', voided && 'text-ink-600 line-through')} data-voided={voided ? 'true' : undefined}>
        <EventDetail event={event} units={units} />
        {event.note ? <p className="whitespace-pre-line">{event.kind === 'void' || event.kind === 'override' ? `Reason: ${event.note}` : event.note}</p> : null}
        <p className="text-sm text-ink-600">
          {[
            event.actorName ? `By ${event.actorName}` : 'By a former user',
            event.workOrder ? `work order ${event.workOrder}` : null,
            event.hourMeterHours != null ? `hour meter ${event.hourMeterHours.toLocaleString()} h` : null,
            late ? `recorded ${formatDateTime(event.recordedAt)}` : null,
          ]
            .filter(Boolean)
            .join(' · ')}
        </p>
      </div>
      {voided ? (
        <p className="rounded-[var(--radius-control)] bg-ink-100 px-3 py-2 text-ink-900">
          <span className="font-semibold">Voided {formatDateTime(voided.at)}:</span> {voided.reason}
        </p>
      ) : null}
      {canVoid && !voided && VOIDABLE_KINDS.has(event.kind) ? (
        <div>
          <Button variant="ghost" onClick={onVoid} className="-ml-4">
            Void this {EVENT_KIND_LABELS[event.kind].toLowerCase()}…
          </Button>
        </div>
      ) : null}
    </li>
  );
}

/** The assembly's history, newest first. Nothing is ever deleted: a correction voids an event with a reason. */
export function AssemblyTimeline({ events, units, canVoid }: { events: AssemblyEventDto[]; units: Preferences; canVoid: boolean }) {
  const [voiding, setVoiding] = useState<AssemblyEventDto | null>(null);
  if (events.length === 0) return <EmptyState title="Nothing recorded yet">The build, tests, installs and removals of this assembly will appear here.</EmptyState>;
  return (
    <>
      <ol className="ml-2 flex flex-col" aria-label="History">
        {events.map((event) => (
          <TimelineItem key={event.id} event={event} units={units} canVoid={canVoid} onVoid={() => setVoiding(event)} />
        ))}
      </ol>
      {voiding ? <VoidEventSheet event={voiding} onClose={() => setVoiding(null)} /> : null}
    </>
  );
}
