import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { describeError, isApiError } from '@/lib/api-client';

/** The form field an input path belongs to: `workingPressure.value` → `workingPressure`, `sizes.0.rating.unit` → `sizes.0.rating`. */
export function fieldOfPath(path: readonly PropertyKey[], renames: Record<string, string> = {}): string {
  const parts = path.map(String);
  while (parts.length > 1 && (parts.at(-1) === 'value' || parts.at(-1) === 'unit')) parts.pop();
  const joined = parts.join('.');
  for (const [from, to] of Object.entries(renames)) {
    if (joined === from || joined.endsWith(`.${from}`)) return joined.slice(0, joined.length - from.length) + to;
  }
  return joined;
}

/** zod's own wording ("Too small: expected number to be >=1") said the way a person reads it. */
function plainMessage(issue: z.core.$ZodIssue, label: string): string {
  if (!/^(Invalid input|Too small|Too big|Invalid option|Invalid)/.test(issue.message)) return issue.message;
  switch (issue.code) {
    case 'too_small':
      return `${label}: enter at least ${String(issue.minimum)}`;
    case 'too_big':
      return `${label}: enter at most ${String(issue.maximum)}`;
    case 'invalid_type':
      return issue.expected === 'int' ? `${label}: enter a whole number` : `${label}: enter a number`;
    case 'invalid_value':
      return `${label}: choose one of the list`;
    default:
      return `Check ${label.toLowerCase()}`;
  }
}

interface SharedSchemaOptions<V> {
  /** The request body the form's values make: what the shared schema parses and the server receives. */
  toInput: (values: V) => unknown;
  schema: z.ZodType;
  /** Input paths whose form field has another name, e.g. `{ upToKpa: 'upTo' }`. */
  renames?: Record<string, string>;
  /** Form field → the words a message starts with when the schema's own message is zod's wording. */
  labels?: Record<string, string>;
}

/**
 * Checks a form of typed text against a shared input schema: the values become the request body,
 * the shared schema parses it, and each problem lands on the field it came from. The form keeps the
 * text as typed (the resolver answers the raw values), so nothing is rounded before it is sent.
 */
export function sharedSchemaResolver<V extends FieldValues>({ toInput, schema, renames, labels = {} }: SharedSchemaOptions<V>) {
  const formSchema = z.custom<V>(() => true).superRefine((values, ctx) => {
    const result = schema.safeParse(toInput(values));
    if (result.success) return;
    const seen = new Set<string>();
    for (const issue of result.error.issues) {
      const field = fieldOfPath(issue.path, renames);
      if (seen.has(field)) continue;
      seen.add(field);
      const label = labels[field.replace(/\.\d+\./g, '.*.')] ?? labels[field] ?? 'This field';
      ctx.addIssue({ code: 'custom', path: field ? field.split('.') : [], message: plainMessage(issue, label) });
    }
  });
  return zodResolver(formSchema, undefined, { raw: true });
}

/**
 * Puts a failed request's message on the form: on the field the server named (an input path such
 * as `burstPressure.value` or `sizes.2.rating.value` lands on its form field) when the form has it,
 * otherwise as the form's own message (`errors.root.server`).
 */
export function applyServerFieldError<V extends FieldValues>(error: unknown, setError: UseFormSetError<V>, fields: readonly string[], renames?: Record<string, string>): void {
  if (isApiError(error) && error.field) {
    const field = fieldOfPath(error.field.split('.'), renames);
    if (fields.some((f) => field === f || field.startsWith(`${f}.`))) {
      setError(field as Path<V>, { type: 'server', message: error.message }, { shouldFocus: true });
      return;
    }
  }
  setError('root.server', { type: 'server', message: describeError(error) });
}
