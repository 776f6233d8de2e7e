import { useId } from 'react';
import { cn } from '@/lib/cn';
import { FieldError } from '@/components/ui/field';

export interface ChoiceOption<V extends string> {
  value: V;
  label: string;
  description?: string;
}

interface ChoiceTilesProps<V extends string> {
  legend: string;
  options: ReadonlyArray<ChoiceOption<V>>;
  value: V | null | undefined;
  onChange: (value: V) => void;
  error?: string;
  /** Columns from a small tablet up; a phone always shows one tile per row. */
  columns?: 1 | 2 | 3;
  hideLegend?: boolean;
  className?: string;
}

/** Large radio tiles, each the width of the screen on a phone and easy to hit with a gloved thumb. */
export function ChoiceTiles<V extends string>({ legend, options, value, onChange, error, columns = 2, hideLegend, className }: ChoiceTilesProps<V>) {
  const groupId = useId();
  const errorId = error ? `${groupId}-error` : undefined;
  return (
    <fieldset className={cn('flex flex-col gap-2', className)} aria-describedby={errorId}>
      <legend className={cn('mb-2 text-lg font-semibold text-ink-900', hideLegend && 'sr-only')}>{legend}</legend>
      <div className={cn('grid grid-cols-1 gap-2', columns === 2 && 'sm:grid-cols-2', columns === 3 && 'sm:grid-cols-3')}>
        {options.map((option) => {
          const id = `${groupId}-${option.value}`;
          const descriptionId = option.description ? `${id}-description` : undefined;
          return (
            <div
              key={option.value}
              className={cn(
                'relative flex min-h-16 items-center gap-3 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-3',
                'hover:border-ink-600 has-[:checked]:border-copper-700 has-[:checked]:bg-copper-50 has-[:checked]:ring-2 has-[:checked]:ring-copper-700',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-copper-500',
              )}
            >
              <input
                id={id}
                type="radio"
                name={groupId}
                value={option.value}
                checked={value === option.value}
                onChange={() => onChange(option.value)}
                aria-describedby={descriptionId}
                aria-invalid={error ? true : undefined}
                className="relative z-10 size-6 shrink-0 accent-copper-700 focus-visible:outline-none"
              />
              <span className="flex flex-col">
                <label htmlFor={id} className="text-lg font-bold text-ink-950 after:absolute after:inset-0 after:content-['']">
                  {option.label}
                </label>
                {option.description ? (
                  <span id={descriptionId} className="text-sm text-ink-700">
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
