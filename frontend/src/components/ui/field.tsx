import { useId, useState, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { AlertIcon, EyeIcon, EyeOffIcon } from './icons';

interface FieldIds {
  id: string;
  describedBy: string | undefined;
  invalid: boolean;
}

interface FieldShellProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  /** Keeps the label for screen readers only, for a field whose purpose is plain from its place. */
  hideLabel?: boolean;
  className?: string;
  id?: string;
  children: (ids: FieldIds) => ReactNode;
}

/** A label, the control, a hint under the label and the error message under the control. */
export function FieldShell({ label, hint, error, hideLabel, className, id: givenId, children }: FieldShellProps) {
  const generated = useId();
  const id = givenId ?? generated;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className={cn('font-semibold text-ink-900', hideLabel && 'sr-only')}>
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-600">
          {hint}
        </p>
      ) : null}
      {children({ id, describedBy, invalid: Boolean(error) })}
      <FieldError id={errorId} message={error} />
    </div>
  );
}

export function FieldError({ id, message }: { id?: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="flex items-start gap-1.5 font-semibold text-danger-700">
      <AlertIcon className="mt-0.5 size-5 shrink-0" />
      <span>{message}</span>
    </p>
  );
}

export const controlClasses =
  'block w-full min-h-12 rounded-[var(--radius-control)] border-2 border-ink-400 bg-white px-3 text-base text-ink-900 ' +
  'placeholder:text-ink-500 hover:border-ink-600 disabled:bg-ink-100 disabled:text-ink-600 ' +
  'aria-invalid:border-danger-700 aria-invalid:bg-danger-50';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  hideLabel?: boolean;
  ref?: Ref<HTMLInputElement>;
  containerClassName?: string;
}

export function TextField({ label, hint, error, hideLabel, id, className, containerClassName, ref, ...props }: TextFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} hideLabel={hideLabel} id={id} className={containerClassName}>
      {(ids) => (
        <input
          ref={ref}
          id={ids.id}
          aria-invalid={ids.invalid || undefined}
          aria-describedby={ids.describedBy}
          className={cn(controlClasses, className)}
          {...props}
        />
      )}
    </FieldShell>
  );
}

/** A password input with a show/hide switch: easier than typing twice with gloves on. */
export function PasswordField({ label, hint, error, id, className, containerClassName, ref, ...props }: Omit<TextFieldProps, 'type'>) {
  const [visible, setVisible] = useState(false);
  return (
    <FieldShell label={label} hint={hint} error={error} id={id} className={containerClassName}>
      {(ids) => (
        <div className="relative">
          <input
            ref={ref}
            id={ids.id}
            type={visible ? 'text' : 'password'}
            aria-invalid={ids.invalid || undefined}
            aria-describedby={ids.describedBy}
            className={cn(controlClasses, 'pr-14', className)}
            autoCapitalize="off"
            autoCorrect="off"
            spellCheck={false}
            {...props}
          />
          <button
            type="button"
            onClick={() => setVisible((v) => !v)}
            aria-pressed={visible}
            aria-label="Show characters"
            className="absolute inset-y-0 right-0 flex w-12 items-center justify-center rounded-r-[var(--radius-control)] text-ink-700 hover:text-ink-950"
          >
            {visible ? <EyeOffIcon /> : <EyeIcon />}
          </button>
        </div>
      )}
    </FieldShell>
  );
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  hideLabel?: boolean;
  ref?: Ref<HTMLSelectElement>;
  options: ReadonlyArray<{ value: string; label: string }>;
  /** A first, empty choice such as "Choose a role" or "All roles". */
  placeholder?: string;
  containerClassName?: string;
}

export function SelectField({ label, hint, error, hideLabel, id, className, containerClassName, options, placeholder, ref, ...props }: SelectFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} hideLabel={hideLabel} id={id} className={containerClassName}>
      {(ids) => (
        <select
          ref={ref}
          id={ids.id}
          aria-invalid={ids.invalid || undefined}
          aria-describedby={ids.describedBy}
          className={cn(controlClasses, 'appearance-auto pr-8', className)}
          {...props}
        >
          {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </FieldShell>
  );
}
