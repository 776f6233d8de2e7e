import { Link } from 'react-router-dom';
import type { PositionLifeDto } from '@shared/schemas/assemblies.schema';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { countOf, formatDay } from '@/lib/format';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { TBody, Td, Th, THead, Table, Tr } from '@/components/ui/table';
import { usePositionHistory } from '../api/get-position-history';
import { ENDING_LABELS, LifeTimeline, lifeEnding } from './life-timeline';
import { days, removalReasonOf } from './position-labels';

const linkClasses = 'font-mono font-semibold tracking-wide text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800';

function Installed({ life }: { life: PositionLifeDto }) {
  return (
    <time dateTime={life.installedAt} className="whitespace-nowrap">
      {life.installedAtEstimated ? 'about ' : ''}
      {formatDay(life.installedAt)}
    </time>
  );
}

function Removed({ life }: { life: PositionLifeDto }) {
  if (!life.removedAt) return <span className="font-semibold text-ink-950">Still in service</span>;
  return (
    <time dateTime={life.removedAt} className="whitespace-nowrap">
      {formatDay(life.removedAt)}
    </time>
  );
}

const hours = (life: PositionLifeDto) => (life.hoursInService == null ? '—' : `${Math.round(life.hoursInService).toLocaleString()} h`);

/** How a life ended: a failure or a suspension, with the removal reason; or still in service. */
function Ending({ life, reference }: { life: PositionLifeDto; reference: ReferenceDto | undefined }) {
  const ending = lifeEnding(life);
  const reason = removalReasonOf(reference, life.removalReason);
  const word = ending === 'failure' ? 'Failure' : ending === 'suspension' ? 'Suspension' : ENDING_LABELS[ending];
  const reasonLabel = reason?.label ?? life.removalReason;
  return (
    <span className="flex flex-col">
      <span
        className={cn(
          'font-bold',
          ending === 'failure' ? 'text-danger-800' : ending === 'in-service' ? 'text-ink-950' : 'text-ink-800',
        )}
      >
        {word}
      </span>
      {reasonLabel && reasonLabel !== word ? <span className="text-sm text-ink-700">{reasonLabel}</span> : null}
    </span>
  );
}

/** Every assembly that has been at the position, newest first, with how long it lasted and how it came out. */
export function PositionHistory({ positionId, reference }: { positionId: string; reference: ReferenceDto | undefined }) {
  const history = usePositionHistory(positionId);

  if (history.isPending) return <SkeletonBlock label="Loading the position's history…" lines={5} />;
  if (history.isError) {
    return <ErrorState title="The history could not be loaded" error={history.error} onRetry={() => void history.refetch()} retrying={history.isFetching} />;
  }
  const lives = history.data;
  if (lives.length === 0) {
    return <EmptyState title="No assembly has been installed here yet">Each assembly installed at this position will show here with its life: when it went in, when it came out and why.</EmptyState>;
  }

  const failures = lives.filter((l) => l.lifeOutcome === 'failure').length;
  const suspensions = lives.filter((l) => !l.current && l.lifeOutcome === 'suspension').length;
  const ended = lives.filter((l) => !l.current);

  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Stat term="Assemblies here" value={lives.length.toLocaleString()} />
        <Stat term="Ended in failure" value={failures.toLocaleString()} danger={failures > 0} />
        <Stat term="Suspensions" value={suspensions.toLocaleString()} />
        <Stat term="Longest finished life" value={ended.length ? days(Math.round(Math.max(...ended.map((l) => l.daysInService)))) : '—'} />
      </dl>
      <LifeTimeline lives={lives} />
      <div className="hidden md:block">
        <Table aria-label="Assemblies at this position">
          <THead>
            <tr>
              <Th>Assembly</Th>
              <Th>Construction</Th>
              <Th>Installed</Th>
              <Th>Removed</Th>
              <Th className="text-right">Days in service</Th>
              <Th className="text-right">Hours</Th>
              <Th>How it ended</Th>
            </tr>
          </THead>
          <TBody>
            {lives.map((life) => (
              <Tr key={`${life.assemblyId}-${life.installedAt}`}>
                <Td>
                  <Link to={paths.assemblies.detail.getHref(life.assemblyId)} className={linkClasses}>
                    {formatTagCode(life.assemblyNumber)}
                  </Link>
                </Td>
                <Td className="font-mono">{life.constructionCode}</Td>
                <Td>
                  <Installed life={life} />
                </Td>
                <Td>
                  <Removed life={life} />
                </Td>
                <Td className="text-right font-semibold tabular-nums">{Math.round(life.daysInService).toLocaleString()}</Td>
                <Td className="text-right tabular-nums">{hours(life)}</Td>
                <Td>
                  <Ending life={life} reference={reference} />
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </div>
      <ul className="flex flex-col gap-3 md:hidden" aria-label="Assemblies at this position">
        {lives.map((life) => (
          <li key={`${life.assemblyId}-${life.installedAt}`} className="rounded-[var(--radius-card)] border-2 border-ink-200 bg-white p-4">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <Link to={paths.assemblies.detail.getHref(life.assemblyId)} className={`${linkClasses} inline-flex min-h-11 items-center text-xl`}>
                {formatTagCode(life.assemblyNumber)}
              </Link>
              <span className="text-lg font-bold text-ink-950">{days(Math.round(life.daysInService))}</span>
            </div>
            <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-2">
              <div>
                <dt className="text-sm font-semibold text-ink-600">Installed</dt>
                <dd>
                  <Installed life={life} />
                </dd>
              </div>
              <div>
                <dt className="text-sm font-semibold text-ink-600">Removed</dt>
                <dd>
                  <Removed life={life} />
                </dd>
              </div>
              <div>
                <dt className="text-sm font-semibold text-ink-600">How it ended</dt>
                <dd>
                  <Ending life={life} reference={reference} />
                </dd>
              </div>
              <div>
                <dt className="text-sm font-semibold text-ink-600">Hours</dt>
                <dd>{hours(life)}</dd>
              </div>
            </dl>
            <p className="mt-2 text-sm text-ink-700">
              Construction <span className="font-mono font-semibold text-ink-900">{life.constructionCode}</span>
            </p>
          </li>
        ))}
      </ul>
      <p className="text-sm text-ink-700">
        {countOf(lives.length, 'life', 'lives')} at this position. A failure ends a life; a planned or serviceable removal is a suspension, counted as
        survival to that day.
      </p>
    </div>
  );
}

function Stat({ term, value, danger = false }: { term: string; value: string; danger?: boolean }) {
  return (
    <div className="flex flex-col rounded-[var(--radius-control)] bg-ink-50 px-3 py-2">
      <dt className="text-sm text-ink-600">{term}</dt>
      <dd className={cn('text-2xl font-bold', danger ? 'text-danger-800' : 'text-ink-950')}>{value}</dd>
    </div>
  );
}
