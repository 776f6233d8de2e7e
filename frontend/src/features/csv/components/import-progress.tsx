import { cn } from '@/lib/cn';

/** A bar of rows done out of rows in the file, with the numbers spelled out beside it. */
export function ImportProgress({ label, processed, total, className }: { label: string; processed: number; total: number; className?: string }) {
  const percent = total > 0 ? Math.min(100, Math.round((processed / total) * 100)) : 0;
  return (
    <div className={cn('flex flex-col gap-2', className)}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-lg font-semibold text-ink-950">{label}</span>
        <span className="text-ink-700" aria-hidden="true">
          {total > 0 ? `${processed.toLocaleString()} of ${total.toLocaleString()} rows · ${percent} %` : 'Reading the file…'}
        </span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={total || 1}
        aria-valuenow={processed}
        aria-valuetext={total > 0 ? `${processed.toLocaleString()} of ${total.toLocaleString()} rows` : 'Reading the file'}
        className="h-4 overflow-hidden rounded-full border border-ink-300 bg-ink-100"
      >
        <div className="h-full rounded-full bg-copper-600 transition-[width] duration-500" style={{ width: `${total > 0 ? Math.max(percent, 2) : 2}%` }} />
      </div>
    </div>
  );
}
