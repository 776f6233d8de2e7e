import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { ArrowDownIcon, ArrowUpIcon, ChevronUpDownIcon } from './icons';

export function Table({ className, children, ...props }: HTMLAttributes<HTMLTableElement>) {
  return (
    <div className="overflow-x-auto rounded-[var(--radius-card)] border border-ink-200 bg-white">
      <table className={cn('w-full border-collapse text-left', className)} {...props}>
        {children}
      </table>
    </div>
  );
}

export function THead({ children }: { children: ReactNode }) {
  return <thead className="border-b-2 border-ink-300 bg-ink-50">{children}</thead>;
}

export function TBody({ children }: { children: ReactNode }) {
  return <tbody className="divide-y divide-ink-200">{children}</tbody>;
}

export function Tr({ className, ...props }: HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={cn('hover:bg-ink-50', className)} {...props} />;
}

export function Th({ className, ...props }: ThHTMLAttributes<HTMLTableCellElement>) {
  return <th scope="col" className={cn('px-3 py-2 text-sm font-bold whitespace-nowrap text-ink-800', className)} {...props} />;
}

export function Td({ className, ...props }: TdHTMLAttributes<HTMLTableCellElement>) {
  return <td className={cn('px-3 py-3 align-top text-ink-900', className)} {...props} />;
}

type SortDirection = false | 'asc' | 'desc';

/** A column heading that sorts when pressed; `aria-sort` on the cell says the current order. */
export function SortableTh({ children, direction, onSort, className }: { children: ReactNode; direction: SortDirection; onSort: () => void; className?: string }) {
  const ariaSort = direction === 'asc' ? 'ascending' : direction === 'desc' ? 'descending' : 'none';
  return (
    <Th aria-sort={ariaSort} className={cn('p-0', className)}>
      <button
        type="button"
        onClick={onSort}
        className="flex min-h-11 w-full items-center gap-1.5 px-3 py-2 text-left font-bold text-ink-800 hover:bg-ink-100 hover:text-ink-950"
      >
        {children}
        {direction === 'asc' ? (
          <ArrowUpIcon className="size-4 text-copper-700" />
        ) : direction === 'desc' ? (
          <ArrowDownIcon className="size-4 text-copper-700" />
        ) : (
          <ChevronUpDownIcon className="size-4 text-ink-500" />
        )}
      </button>
    </Th>
  );
}
