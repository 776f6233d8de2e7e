import { createContext, useContext, type ComponentProps, type ReactNode } from 'react';
import type { ArchivedFilter } from '@shared/schemas/register.schema';
import { cn } from '@/lib/cn';
import { Button } from '@/components/ui/button';

/** What every branch of the tree needs: which branches are open, and whether archived ones show. */
export interface TreeState {
  isOpen: (key: string) => boolean;
  toggle: (key: string) => void;
  /** Opens a branch and leaves it open if it is. */
  expand: (key: string) => void;
  archived: ArchivedFilter;
}

export const TreeContext = createContext<TreeState | null>(null);

export function useTree(): TreeState {
  const tree = useContext(TreeContext);
  if (!tree) throw new Error('useTree needs the sites tree around it');
  return tree;
}

function ChevronIcon({ open }: { open: boolean }) {
  return (
    <svg
      viewBox="0 0 24 24"
      width="24"
      height="24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2.5}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      className={cn('size-6 shrink-0 text-ink-700 transition-transform', open && 'rotate-90')}
    >
      <path d="m9 5 7 7-7 7" />
    </svg>
  );
}

interface BranchToggleProps {
  open: boolean;
  onToggle: () => void;
  controls: string;
  /** The code, asset number or other short key, in a fixed-width face. */
  code: string;
  name: string;
  /** A word or two after the name: a count, "Archived", "Hour meter". */
  extra?: ReactNode;
  level: 'site' | 'area' | 'equipment';
}

/** The row that opens and closes a branch: the whole row is the target, at least 48 px high. */
export function BranchToggle({ open, onToggle, controls, code, name, extra, level }: BranchToggleProps) {
  return (
    <button
      type="button"
      onClick={onToggle}
      aria-expanded={open}
      aria-controls={controls}
      className={cn(
        'flex w-full min-w-0 items-center gap-3 rounded-[var(--radius-control)] px-2 text-left hover:bg-ink-100 sm:w-auto sm:flex-1',
        level === 'site' ? 'min-h-14' : 'min-h-12',
      )}
    >
      <ChevronIcon open={open} />
      <span className="flex min-w-0 flex-1 flex-wrap items-baseline gap-x-3 gap-y-0.5 py-2">
        <span className={cn('font-mono font-semibold text-ink-700', level === 'site' ? 'text-base' : 'text-sm')}>{code}</span>
        <span className={cn('font-bold text-ink-950', level === 'site' ? 'text-xl' : level === 'area' ? 'text-lg' : 'text-base')}>{name}</span>
        {extra ? <span className="flex flex-wrap items-center gap-2 text-sm font-normal text-ink-700">{extra}</span> : null}
      </span>
    </button>
  );
}

/** The actions of a row, beside it on a desktop and under it on a phone. */
export function RowActions({ children }: { children: ReactNode }) {
  return <div className="flex shrink-0 flex-wrap gap-2 pl-11 sm:flex-nowrap sm:pl-0">{children}</div>;
}

/** A row's action: plain words in the accent colour, underlined so it reads as something to press. */
export function RowActionButton({ className, ...props }: ComponentProps<typeof Button>) {
  return <Button variant="ghost" className={cn('text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800', className)} {...props} />;
}

/** An open branch's children, drawn inside a rule that shows which row they belong to. */
export function BranchBody({ id, children, className }: { id: string; children: ReactNode; className?: string }) {
  return (
    <div id={id} className={cn('ml-5 flex flex-col gap-2 border-l-2 border-ink-200 pt-1 pb-2 pl-3 sm:ml-6 sm:pl-4', className)}>
      {children}
    </div>
  );
}

/** "Show more" at the end of a branch with more rows than one request brings. */
export function ShowMore({ shown, total, noun, onMore, loading }: { shown: number; total: number; noun: string; onMore: () => void; loading: boolean }) {
  if (shown >= total) return null;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <span className="text-sm text-ink-700">
        Showing {shown.toLocaleString()} of {total.toLocaleString()} {noun}
      </span>
      <Button variant="secondary" onClick={onMore} loading={loading}>
        Show more
      </Button>
    </div>
  );
}

/** A short, plain line for an empty branch. */
export function BranchEmpty({ children }: { children: ReactNode }) {
  return <p className="rounded-[var(--radius-control)] border-2 border-dashed border-ink-300 bg-ink-50 px-3 py-2.5 text-ink-700">{children}</p>;
}
