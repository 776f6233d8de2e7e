import { Skeleton } from '@/components/ui/skeleton';

/** Placeholder rows of a list on its way, with a spoken label. */
export function ListSkeleton({ label, columns = 5 }: { label: string; columns?: number }) {
  return (
    <div role="status" className="flex flex-col gap-3 rounded-[var(--radius-card)] border border-ink-200 bg-white p-4">
      <span className="sr-only">{label}</span>
      {Array.from({ length: 6 }, (_, i) => (
        <div key={i} className="grid grid-cols-2 gap-4 md:grid-cols-5">
          {Array.from({ length: Math.min(columns, 5) }, (_, j) => (
            <Skeleton key={j} className={j < 2 ? 'h-6' : 'hidden h-6 md:block'} />
          ))}
        </div>
      ))}
    </div>
  );
}
