import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { FieldError } from './field';

interface CheckboxProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A checkbox with its label in one row at least 44 px high, so the whole row can be tapped. */
export function Checkbox({ label, hint, error, id: givenId, className, ref, ...props }: CheckboxProps) {
  const generated = useId();
  const id = givenId ?? generated;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <div className="flex min-h-11 items-start gap-3">
        <input
          ref={ref}
          id={id}
          type="checkbox"
          aria-invalid={error ? true : undefined}
          aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
          className="mt-2.5 size-6 shrink-0 accent-copper-700"
          {...props}
        />
        <label htmlFor={id} className="flex min-h-11 flex-1 items-center py-2 font-semibold text-ink-900">
          {label}
        </label>
      </div>
      {hint ? (
        <p id={hintId} className="pl-9 text-sm text-ink-600">
          {hint}
        </p>
      ) : null}
      <FieldError id={errorId} message={error} />
    </div>
  );
}
