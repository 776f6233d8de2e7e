import { Link } from 'react-router-dom';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';

const linkClasses = 'font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800';

/** Today's calendar date where the reader is, as `2026-12-01`. */
export function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** An assembly's number as printed on its tag, opening its page. */
export function AssemblyNumberLink({ assembly, className }: { assembly: Pick<AssemblyListItemDto, 'id' | 'number'>; className?: string }) {
  return (
    <Link to={paths.assemblies.detail.getHref(assembly.id)} className={cn(linkClasses, 'font-mono tracking-wide whitespace-nowrap', className)}>
      {formatTagCode(assembly.number)}
    </Link>
  );
}

/** The position's code, opening its page, with its name under it. */
export function PositionCell({ position, large = false }: { position: AssemblyListItemDto['position']; large?: boolean }) {
  if (!position) return <span className="text-ink-600">Not installed</span>;
  return (
    <span className="flex flex-col">
      <Link to={paths.positions.detail.getHref(position.id)} className={cn(linkClasses, 'font-mono', large ? 'inline-flex min-h-11 items-center text-lg [overflow-wrap:anywhere]' : 'whitespace-nowrap')}>
        {position.code}
      </Link>
      <span className={cn('text-ink-700', large ? 'text-base' : 'text-sm')}>{position.name}</span>
    </span>
  );
}

/** When the next inspection is due, with "Overdue" spelled out once the day has passed. */
export function DueDate({ due, today = todayIso(), large = false }: { due: string | null; today?: string; large?: boolean }) {
  if (!due) return <span className="text-ink-600">Not scheduled</span>;
  const overdue = due < today;
  return (
    <span className={cn('inline-flex gap-x-2 gap-y-0.5 whitespace-nowrap', large ? 'flex-wrap items-center text-lg' : 'flex-col items-start')}>
      <time dateTime={due} className={cn('font-semibold', overdue ? 'text-danger-800' : 'text-ink-950')}>
        {formatDate(due)}
      </time>
      {overdue ? <span className="rounded-sm bg-danger-700 px-1.5 text-sm font-bold tracking-wide text-white">Overdue</span> : null}
    </span>
  );
}
