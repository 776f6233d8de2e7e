import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

/** What a list shows when it has nothing in it: what that means and what to do next. */
export function EmptyState({ title, children, action, className, headingLevel = 3 }: { title: string; children?: ReactNode; action?: ReactNode; className?: string; headingLevel?: 2 | 3 }) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <div className={cn('flex flex-col items-start gap-2 rounded-[var(--radius-control)] border-2 border-dashed border-ink-300 bg-ink-50 px-5 py-6', className)}>
      <Heading className="text-lg font-bold text-ink-950">{title}</Heading>
      {children ? <div className="text-ink-700">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
