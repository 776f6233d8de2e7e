import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { FieldError } from './field';

interface RadioTilesProps<V extends string> extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'value'> {
  legend: string;
  options: ReadonlyArray<{ value: V; label: string; description?: string }>;
  error?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A group of large radio tiles, each easy to hit with a gloved thumb. Pass `register(name)` props. */
export function RadioTiles<V extends string>({ legend, options, error, className, ...inputProps }: RadioTilesProps<V>) {
  const groupId = useId();
  const errorId = error ? `${groupId}-error` : undefined;
  return (
    <fieldset className={cn('flex flex-col gap-2', className)} aria-describedby={errorId}>
      <legend className="mb-2 text-lg font-semibold text-ink-900">{legend}</legend>
      <div className="grid grid-cols-1 gap-2 sm:grid-cols-3">
        {options.map((option) => {
          const id = `${groupId}-${option.value}`;
          const descriptionId = option.description ? `${id}-description` : undefined;
          return (
            <div
              key={option.value}
              className={cn(
                'relative flex min-h-16 items-center gap-3 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-3',
                'hover:border-ink-600 has-[:checked]:border-copper-700 has-[:checked]:bg-copper-50',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-copper-500',
              )}
            >
              <input
                id={id}
                type="radio"
                value={option.value}
                aria-describedby={descriptionId}
                className="size-6 shrink-0 accent-copper-700 focus-visible:outline-none"
                {...inputProps}
              />
              <span className="flex flex-col">
                <label htmlFor={id} className="text-lg font-bold text-ink-950 after:absolute after:inset-0 after:content-['']">
                  {option.label}
                </label>
                {option.description ? (
                  <span id={descriptionId} className="text-sm text-ink-600">
                    {option.description}
                  </span>
                ) : null}
              </span>
            </div>
          );
        })}
      </div>
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
