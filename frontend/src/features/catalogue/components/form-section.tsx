import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

/** A titled group of fields in a long form. */
export function FormSection({ legend, description, children, className }: { legend: string; description?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <fieldset className={cn('flex flex-col gap-4 border-t border-ink-200 pt-4 first:border-t-0 first:pt-0', className)}>
      <legend className="float-left mb-1 w-full text-lg font-bold text-ink-950">{legend}</legend>
      {description ? <p className="-mt-2 text-sm text-ink-600">{description}</p> : null}
      {children}
    </fieldset>
  );
}
