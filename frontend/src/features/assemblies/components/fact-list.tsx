import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

/** Label and value pairs, two columns where there is room. */
export function FactList({ children, className }: { children: ReactNode; className?: string }) {
  return <dl className={cn('grid grid-cols-2 gap-x-4 gap-y-3 sm:gap-x-6', className)}>{children}</dl>;
}

export function Fact({ label, children, wide }: { label: ReactNode; children: ReactNode; wide?: boolean }) {
  return (
    <div className={cn('flex min-w-0 flex-col', wide && 'col-span-2')}>
      <dt className="text-sm font-semibold text-ink-600">{label}</dt>
      <dd className="text-ink-950">{children}</dd>
    </div>
  );
}

/** Shown where a value was never recorded. */
export function NotRecorded({ children = 'Not recorded' }: { children?: ReactNode }) {
  return <span className="text-ink-600">{children}</span>;
}
