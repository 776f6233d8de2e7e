import type { ReactNode, Ref, TextareaHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { controlClasses, FieldShell } from '@/components/ui/field';

interface TextareaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  containerClassName?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

/** Several lines of free text with its label, hint and error. */
export function TextareaField({ label, hint, error, id, className, containerClassName, ref, rows = 3, ...props }: TextareaFieldProps) {
  return (
    <FieldShell label={label} hint={hint} error={error} id={id} className={containerClassName}>
      {(ids) => (
        <textarea
          ref={ref}
          id={ids.id}
          rows={rows}
          aria-invalid={ids.invalid || undefined}
          aria-describedby={ids.describedBy}
          className={cn(controlClasses, 'py-2', className)}
          {...props}
        />
      )}
    </FieldShell>
  );
}
