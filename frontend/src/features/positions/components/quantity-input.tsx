import { useEffect, useState, type ReactNode } from 'react';
import { Controller, useFormContext, type FieldError as HookFieldError, type FieldValues, type Path, type Resolver } from 'react-hook-form';
import { controlClasses, FieldShell } from '@/components/ui/field';
import { cn } from '@/lib/cn';

/** A quantity as the API takes it: the number as typed and the unit it was typed in. */
export interface Quantity<U extends string = string> {
  value: number;
  unit: U;
}

/** What a quantity field holds while its text is not a number: the text itself, which the schema refuses. */
type QuantityDraft = { value: number | string; unit: string };

/** What a person typed in a number field: null when empty, NaN when it is not a number. A decimal comma is read as a point. */
export function parseDecimal(text: string): number | null {
  const trimmed = text.trim().replace(/\s+/g, '');
  if (trimmed === '') return null;
  const normal = trimmed.replace(',', '.').replace(/^\u2212/, '-');
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(normal) ? Number(normal) : Number.NaN;
}

/**
 * A stored value put back into a field, to five significant figures: none of the noise of the
 * conversion (150 psi, not 150.00000000000003). A field left alone is not sent, so nothing is lost.
 */
export function editableNumber(value: number): number {
  return Number(value.toPrecision(5));
}

const textOf = (quantity: QuantityDraft | null | undefined) => (quantity == null ? '' : String(quantity.value));

/** The message of a field whose value is an object: its own, or that of its number or unit. */
export function messageOf(error: unknown): string | undefined {
  if (!error || typeof error !== 'object') return undefined;
  const e = error as Partial<HookFieldError> & { value?: HookFieldError; unit?: HookFieldError };
  return e.message ?? e.value?.message ?? e.unit?.message;
}

/**
 * The schema names a quantity's faults on its number or unit (`maxTemp.value`); the form keeps
 * each quantity as one field, so the message is lifted onto the field itself.
 */
export function withQuantityErrors<T extends FieldValues, C, O>(resolver: Resolver<T, C, O>, names: readonly string[]): Resolver<T, C, O> {
  return async (values, context, options) => {
    const result = await resolver(values, context, options);
    const errors = result.errors as Record<string, (Partial<HookFieldError> & { value?: HookFieldError; unit?: HookFieldError }) | undefined>;
    for (const name of names) {
      const error = errors[name];
      const inner = error && !error.message ? (error.value ?? error.unit) : undefined;
      if (error && inner) errors[name] = { ...inner, ref: error.ref };
    }
    return result;
  };
}

interface QuantityFieldProps<T extends FieldValues> {
  name: Path<T>;
  label: ReactNode;
  /** The unit the number is typed in and sent with. */
  unit: string;
  /** The unit as the reader sees it: "°F", "psi". */
  symbol: string;
  hint?: ReactNode;
  containerClassName?: string;
}

/**
 * A number typed in the reader's unit, kept in the form as `{ value, unit }` (or null when empty)
 * so the shared schema checks it as it is typed and the server converts it.
 */
export function QuantityField<T extends FieldValues>({ name, label, unit, symbol, hint, containerClassName }: QuantityFieldProps<T>) {
  const { control } = useFormContext<T>();
  return (
    <Controller
      name={name}
      control={control}
      render={({ field, fieldState }) => (
        <QuantityInput
          label={label}
          symbol={symbol}
          hint={hint}
          containerClassName={containerClassName}
          error={messageOf(fieldState.error)}
          value={field.value as QuantityDraft | null}
          inputRef={field.ref}
          onBlur={field.onBlur}
          onChange={(text) => {
            const value = parseDecimal(text);
            // Text that is not a number stays text, so the schema names the field "must be a number".
            field.onChange(value === null ? null : { value: Number.isNaN(value) ? text.trim() : value, unit });
          }}
        />
      )}
    />
  );
}

interface QuantityInputProps {
  label: ReactNode;
  symbol: string;
  hint?: ReactNode;
  error?: string;
  containerClassName?: string;
  value: QuantityDraft | null;
  onChange: (text: string) => void;
  onBlur: () => void;
  inputRef: (element: HTMLInputElement | null) => void;
}

function QuantityInput({ label, symbol, hint, error, containerClassName, value, onChange, onBlur, inputRef }: QuantityInputProps) {
  const [text, setText] = useState(() => textOf(value));

  // The form was reset or filled from elsewhere: show its value unless the text already reads as it.
  useEffect(() => {
    const typed = parseDecimal(text);
    const same = value == null ? typed === null : typeof value.value === 'string' ? value.value === text.trim() : typed === value.value;
    if (!same) setText(textOf(value));
    // Only a change of the value from outside matters here, not each keystroke.
  }, [value]);

  return (
    <FieldShell
      label={
        <>
          {label}
          <span className="sr-only">, in {symbol}</span>
        </>
      }
      hint={hint}
      error={error}
      className={containerClassName}
    >
      {(ids) => (
        <div className="relative">
          <input
            ref={inputRef}
            id={ids.id}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            aria-invalid={ids.invalid || undefined}
            aria-describedby={ids.describedBy}
            className={cn(controlClasses, 'pr-16 tabular-nums')}
            value={text}
            onBlur={onBlur}
            onChange={(event) => {
              setText(event.target.value);
              onChange(event.target.value);
            }}
          />
          <span
            aria-hidden="true"
            className="pointer-events-none absolute inset-y-0 right-0 flex min-w-14 items-center justify-center rounded-r-[var(--radius-control)] border-l-2 border-ink-200 bg-ink-50 px-2 font-semibold text-ink-700"
          >
            {symbol}
          </span>
        </div>
      )}
    </FieldShell>
  );
}
