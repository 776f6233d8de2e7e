import type { CheckOutcome, CheckResult } from '@shared/checks/types';
import { Badge } from '@/components/ui/badge';
import { cn } from '@/lib/cn';
import { checkLabel, OUTCOME_LABELS, OUTCOME_TONES } from './labels';

const ORDER: Record<CheckOutcome, number> = { fail: 0, warn: 1, pass: 2 };

/** Fails first, then warnings, then passes; the checks' own order within each. */
export function byOutcome(results: CheckResult[]): CheckResult[] {
  return results.map((r, i) => ({ r, i })).sort((a, b) => ORDER[a.r.outcome] - ORDER[b.r.outcome] || a.i - b.i).map(({ r }) => r);
}

/** How many checks gave each outcome: "1 fail, 2 warnings, 8 passes". */
export function outcomeCounts(results: CheckResult[]): string {
  const count = (o: CheckOutcome) => results.filter((r) => r.outcome === o).length;
  const parts = [
    [count('fail'), 'fail', 'fails'],
    [count('warn'), 'warning', 'warnings'],
    [count('pass'), 'pass', 'passes'],
  ] as const;
  return parts
    .filter(([n]) => n > 0)
    .map(([n, one, many]) => `${n} ${n === 1 ? one : many}`)
    .join(', ');
}

interface CheckResultListProps {
  results: CheckResult[];
  /** Two columns on a wide screen, for the full list on the assembly page. */
  wide?: boolean;
  /** Checks a competent person accepted at this position. */
  overridden?: ReadonlySet<string>;
  showSources?: boolean;
  className?: string;
}

/** Each selection check with its outcome in words, the sentence for a fitter, and where its rule comes from. */
export function CheckResultList({ results, overridden, showSources = true, wide, className }: CheckResultListProps) {
  return (
    <ul
      className={cn(wide ? 'grid grid-cols-1 gap-x-8 gap-y-4 lg:grid-cols-2' : 'flex flex-col divide-y divide-ink-200', className)}
      aria-label="Selection checks"
    >
      {byOutcome(results).map((result) => (
        <li
          key={result.check}
          className={cn(
            'flex flex-col gap-1.5',
            wide ? 'border-t border-ink-200 pt-3' : 'py-3 first:pt-0 last:pb-0',
            wide && result.outcome === 'fail' && 'border-t-4 border-danger-700',
          )}
        >
          <div className="flex flex-wrap items-center gap-2">
            <Badge tone={OUTCOME_TONES[result.outcome]}>{OUTCOME_LABELS[result.outcome]}</Badge>
            <span className="font-bold text-ink-950">{checkLabel(result.check)}</span>
            {overridden?.has(result.check) ? <Badge tone="inverse">Overridden</Badge> : null}
            {result.outcome === 'fail' && !result.overridable ? <span className="text-sm font-semibold text-danger-800">Cannot be overridden</span> : null}
          </div>
          <p className="text-ink-900">{result.sentence}</p>
          {showSources && result.source.length ? (
            <p className="text-sm text-ink-600">
              <span className="font-semibold">Source{result.source.length > 1 ? 's' : ''}: </span>
              {result.source.map((s, i) => (
                <span key={`${s.title}-${i}`}>
                  {i > 0 ? '; ' : ''}
                  <cite className="not-italic">{s.title}</cite>, {s.section}
                </span>
              ))}
            </p>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
