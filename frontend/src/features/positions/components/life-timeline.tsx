import { Link } from 'react-router-dom';
import type { PositionLifeDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { formatDay } from '@/lib/format';
import { days } from './position-labels';

const DAY_MS = 86_400_000;

/** How a life ended, in words: the bar's fill only helps the eye. */
export function lifeEnding(life: Pick<PositionLifeDto, 'current' | 'lifeOutcome'>): 'in-service' | 'failure' | 'suspension' | 'unknown' {
  if (life.current) return 'in-service';
  return life.lifeOutcome ?? 'unknown';
}

export const ENDING_LABELS = { 'in-service': 'In service', failure: 'Failed', suspension: 'Suspended', unknown: 'Removed' } as const;

const FILLS: Record<ReturnType<typeof lifeEnding>, string> = {
  'in-service': 'bg-copper-500',
  failure: 'bg-danger-700',
  // Stripes tell a suspension from a failure without relying on the colour.
  suspension: 'bg-ink-400 bg-[repeating-linear-gradient(135deg,transparent_0_6px,rgba(255,255,255,0.45)_6px_10px)]',
  unknown: 'bg-ink-300',
};

function yearTicks(start: number, end: number): Array<{ at: number; label: string }> {
  const ticks: Array<{ at: number; label: string }> = [];
  const first = new Date(start);
  for (let year = first.getFullYear() + 1; ; year++) {
    const at = new Date(year, 0, 1).getTime();
    if (at >= end) break;
    ticks.push({ at, label: String(year) });
  }
  return ticks;
}

/**
 * Each assembly's time at the position as a bar on one time line, newest at the top: a bar's
 * length is how long that hose lasted, its end says how it came out.
 */
export function LifeTimeline({ lives, now = Date.now() }: { lives: PositionLifeDto[]; now?: number }) {
  if (lives.length === 0) return null;
  const starts = lives.map((l) => new Date(l.installedAt).getTime());
  const ends = lives.map((l) => (l.removedAt ? new Date(l.removedAt).getTime() : now));
  const start = Math.min(...starts);
  const end = Math.max(now, ...ends);
  const span = Math.max(end - start, DAY_MS);
  const at = (t: number) => ((t - start) / span) * 100;
  const longest = Math.max(...lives.map((l) => l.daysInService));

  return (
    <figure className="flex flex-col gap-2" aria-labelledby="life-timeline-caption">
      <figcaption id="life-timeline-caption" className="sr-only">
        Time line of the assemblies at this position, newest first. The table below lists the same lives.
      </figcaption>
      <ol className="flex flex-col gap-3 sm:gap-2">
        {lives.map((life, i) => {
          const ending = lifeEnding(life);
          const left = at(starts[i]!);
          const width = Math.max(at(ends[i]!) - left, 0.8);
          const summary = `${days(Math.round(life.daysInService))} · ${ENDING_LABELS[ending]}`;
          return (
            <li key={`${life.assemblyId}-${life.installedAt}`} className="grid grid-cols-1 gap-1 sm:grid-cols-[13rem_minmax(0,1fr)] sm:items-center sm:gap-3">
              <span className="flex flex-wrap items-baseline gap-x-3">
                <Link
                  to={paths.assemblies.detail.getHref(life.assemblyId)}
                  className="inline-flex min-h-11 items-center font-mono font-semibold tracking-wide text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800"
                >
                  {formatTagCode(life.assemblyNumber)}
                </Link>
                <span className={cn('text-sm font-bold whitespace-nowrap', ending === 'failure' ? 'text-danger-800' : 'text-ink-900')}>{summary}</span>
              </span>
              <div className="relative h-7 overflow-hidden rounded-sm bg-ink-100" aria-hidden="true">
                <div
                  className={cn('absolute inset-y-0 rounded-sm', FILLS[ending], ending === 'in-service' && 'rounded-r-none')}
                  style={{ left: `${left}%`, width: `${width}%` }}
                  title={`${formatTagCode(life.assemblyNumber)}: ${formatDay(life.installedAt)} to ${life.removedAt ? formatDay(life.removedAt) : 'now'}, ${summary}`}
                />
              </div>
              {life.daysInService === longest && lives.length > 1 ? <span className="sr-only">The longest life at this position.</span> : null}
            </li>
          );
        })}
      </ol>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-[13rem_minmax(0,1fr)]" aria-hidden="true">
        <span className="hidden sm:block" />
        <div className="relative h-5 border-t-2 border-ink-300 text-xs text-ink-700">
          <span className="absolute left-0 pt-0.5">{formatDay(new Date(start).toISOString())}</span>
          {yearTicks(start, end)
            .filter((t) => at(t.at) > 22 && at(t.at) < 85)
            .map((t) => (
              <span key={t.label} className="absolute -translate-x-1/2 border-l-2 border-ink-300 pt-0.5 pl-1" style={{ left: `${at(t.at)}%` }}>
                {t.label}
              </span>
            ))}
          <span className="absolute right-0 pt-0.5">Today</span>
        </div>
      </div>
      <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-800" aria-label="Key">
        <li className="flex items-center gap-2">
          <span aria-hidden="true" className={cn('inline-block h-3 w-6 rounded-sm', FILLS.failure)} /> Failed: the life ended in a failure
        </li>
        <li className="flex items-center gap-2">
          <span aria-hidden="true" className={cn('inline-block h-3 w-6 rounded-sm', FILLS.suspension)} /> Suspended: taken out still serviceable
        </li>
        <li className="flex items-center gap-2">
          <span aria-hidden="true" className={cn('inline-block h-3 w-6 rounded-sm', FILLS['in-service'])} /> In service now
        </li>
      </ul>
    </figure>
  );
}
