import type { InputHTMLAttributes, ReactNode, Ref } from 'react';
import { cn } from '@/lib/cn';
import { controlClasses, FieldShell } from '@/components/ui/field';

interface MeasureFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'children'> {
  label: ReactNode;
  /** The unit shown after the number, e.g. "bar". */
  unit: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
  containerClassName?: string;
}

/** A number in the user's unit, with the unit written after it so nobody types bar into a psi field. */
export function MeasureField({ label, unit, hint, error, id, className, containerClassName, ref, ...props }: MeasureFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} id={id} className={containerClassName}>
      {(ids) => (
        <div className="flex items-stretch">
          <input
            ref={ref}
            id={ids.id}
            inputMode="decimal"
            autoComplete="off"
            aria-invalid={ids.invalid || undefined}
            aria-describedby={ids.describedBy}
            className={cn(controlClasses, 'rounded-r-none', className)}
            {...props}
          />
          <span
            className="flex min-w-14 items-center justify-center rounded-r-[var(--radius-control)] border-2 border-l-0 border-ink-400 bg-ink-100 px-3 font-semibold text-ink-800"
            aria-hidden="true"
          >
            {unit}
          </span>
        </div>
      )}
    </FieldShell>
  );
}
