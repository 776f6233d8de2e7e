import { useEffect, useId, useRef, useState } from 'react';
import { Button, buttonClasses } from '@/components/ui/button';
import { CheckIcon } from '@/components/ui/icons';
import { DEFAULT_COLUMNS, FIXED_COLUMNS, REGISTER_COLUMNS, type RegisterColumn } from '../hooks/use-register-search';
import { COLUMN_LABELS } from './register-table';

interface ColumnChooserProps {
  columns: readonly RegisterColumn[];
  onChange: (columns: RegisterColumn[]) => void;
}

/** Which columns the desktop table shows; the choice is kept in the address with the rest of the view. */
export function ColumnChooser({ columns, onChange }: ColumnChooserProps) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const wrapperRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (!open) return;
    const handlePointer = (event: MouseEvent) => {
      if (wrapperRef.current && !wrapperRef.current.contains(event.target as Node)) setOpen(false);
    };
    const handleKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setOpen(false);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener('mousedown', handlePointer);
    document.addEventListener('keydown', handleKey);
    return () => {
      document.removeEventListener('mousedown', handlePointer);
      document.removeEventListener('keydown', handleKey);
    };
  }, [open]);

  const toggle = (column: RegisterColumn, shown: boolean) => {
    onChange(shown ? REGISTER_COLUMNS.filter((c) => c === column || columns.includes(c)) : columns.filter((c) => c !== column));
  };
  const isDefault = columns.length === DEFAULT_COLUMNS.length && columns.every((c) => DEFAULT_COLUMNS.includes(c));

  return (
    <div ref={wrapperRef} className="relative hidden md:block">
      <button type="button" ref={buttonRef} className={buttonClasses('secondary')} aria-expanded={open} aria-controls={panelId} onClick={() => setOpen((v) => !v)}>
        Columns
        <span className="text-sm font-normal text-ink-700">
          {columns.length} of {REGISTER_COLUMNS.length}
        </span>
      </button>
      {open ? (
        <div
          id={panelId}
          role="group"
          aria-label="Columns to show"
          className="absolute right-0 z-30 mt-2 w-72 rounded-[var(--radius-card)] border border-ink-300 bg-white p-3 shadow-xl"
        >
          <p className="px-1 pb-2 text-sm text-ink-700">Show these columns in the table:</p>
          <ul className="flex flex-col">
            {REGISTER_COLUMNS.map((column) => {
              const fixed = FIXED_COLUMNS.includes(column);
              const id = `${panelId}-${column}`;
              return (
                <li key={column} className="flex min-h-11 items-center gap-3 rounded-[var(--radius-control)] px-1 hover:bg-ink-50">
                  <input
                    id={id}
                    type="checkbox"
                    className="size-6 shrink-0 accent-copper-700"
                    checked={columns.includes(column)}
                    disabled={fixed}
                    onChange={(event) => toggle(column, event.target.checked)}
                  />
                  <label htmlFor={id} className="flex min-h-11 flex-1 items-center py-2 font-semibold text-ink-900">
                    {COLUMN_LABELS[column]}
                    {fixed ? <span className="ml-2 text-sm font-normal text-ink-600">always shown</span> : null}
                  </label>
                </li>
              );
            })}
          </ul>
          <div className="mt-2 flex justify-between gap-2 border-t border-ink-100 pt-3">
            <Button variant="ghost" onClick={() => onChange([...DEFAULT_COLUMNS])} disabled={isDefault}>
              Default columns
            </Button>
            <Button variant="secondary" icon={<CheckIcon className="size-5" />} onClick={() => setOpen(false)}>
              Done
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
