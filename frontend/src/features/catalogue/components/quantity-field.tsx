import type { InputHTMLAttributes, ReactNode, Ref } from 'react';
import { cn } from '@/lib/cn';
import { controlClasses, FieldShell } from '@/components/ui/field';

interface QuantityFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'children' | 'type'> {
  label: ReactNode;
  /** The unit the number is typed in, shown inside the field: "psi", "°F", "mm". */
  unit: string;
  hint?: ReactNode;
  error?: string;
  hideLabel?: boolean;
  containerClassName?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A number typed in a stated unit; the unit sits inside the field so it is read with the number. */
export function QuantityField({ label, unit, hint, error, hideLabel, id, className, containerClassName, ref, ...props }: QuantityFieldProps) {
  return (
    <FieldShell
      label={
        <>
          {label}
          <span className="sr-only">, {unit}</span>
        </>
      }
      hint={hint} error={error} hideLabel={hideLabel} id={id} className={containerClassName}>
      {(ids) => (
        <div className="relative">
          <input
            ref={ref}
            id={ids.id}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            aria-invalid={ids.invalid || undefined}
            aria-describedby={ids.describedBy}
            className={cn(controlClasses, 'pr-16 tabular-nums', className)}
            {...props}
          />
          <span aria-hidden="true" className="pointer-events-none absolute inset-y-[2px] right-[2px] flex min-w-14 items-center justify-center rounded-r-[calc(var(--radius-control)-2px)] border-l-2 border-ink-200 bg-ink-50 px-2 font-semibold text-ink-700">
            {unit}
          </span>
        </div>
      )}
    </FieldShell>
  );
}
