import type { CheckOutcome } from '@shared/checks/types';
import { cn } from '@/lib/cn';
import { AlertIcon, CheckIcon } from './icons';

export const CHECK_OUTCOME_LABELS: Record<CheckOutcome, string> = { pass: 'Pass', warn: 'Warning', fail: 'Fail' };

const tones: Record<CheckOutcome | 'none', string> = {
  pass: 'bg-success-100 text-success-700 border-success-700/40',
  warn: 'bg-copper-100 text-copper-800 border-copper-300',
  fail: 'bg-danger-100 text-danger-800 border-danger-700/50',
  none: 'bg-white text-ink-600 border-ink-400 border-dashed',
};

/**
 * The selection checks' overall answer for an assembly where it is, as a word with an icon: the
 * tint only helps scanning. `overridden` adds that a competent person accepted a failed check.
 */
export function CheckOutcomeBadge({ outcome, overridden = false, size = 'md', className }: { outcome: CheckOutcome | null; overridden?: boolean; size?: 'md' | 'lg'; className?: string }) {
  const tone = outcome ?? 'none';
  const iconClass = size === 'lg' ? 'size-5' : 'size-4';
  return (
    <span className={cn('inline-flex flex-wrap items-center gap-1.5', className)}>
      <span
        className={cn(
          'inline-flex items-center gap-1 rounded-full border font-semibold whitespace-nowrap',
          size === 'lg' ? 'px-3 py-1 text-base' : 'px-2.5 py-0.5 text-sm',
          tones[tone],
        )}
      >
        {outcome === 'pass' ? <CheckIcon className={iconClass} /> : outcome ? <AlertIcon className={iconClass} /> : null}
        {outcome ? CHECK_OUTCOME_LABELS[outcome] : 'Not checked'}
      </span>
      {overridden ? (
        <span
          title="A failed check was accepted by a competent person, with a reason and a review date"
          className={cn('inline-flex items-center rounded-full border-2 border-ink-700 bg-white font-semibold whitespace-nowrap text-ink-900', size === 'lg' ? 'px-3 py-0.5 text-base' : 'px-2 py-0 text-sm')}
        >
          Overridden
        </span>
      ) : null}
    </span>
  );
}
