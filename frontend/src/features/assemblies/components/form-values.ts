import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldValues, Resolver } from 'react-hook-form';
import { z } from 'zod';
import { isApiError } from '@/lib/api-client';

/** A number as typed: a comma is read as the decimal point; blank is null; anything else unreadable is NaN (refused). */
export function numberOrNull(text: string | undefined | null): number | null {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return null;
  const value = Number(trimmed.replace(',', '.'));
  return value;
}

/** A typed measurement with its unit, as the API takes it; null when blank. */
export function measurement<U extends string>(text: string | undefined | null, unit: U): { value: number; unit: U } | null {
  const value = numberOrNull(text);
  return value === null ? null : { value, unit };
}

/** Blank text as null. */
export function textOrNull(text: string | undefined | null): string | null {
  const trimmed = (text ?? '').trim();
  return trimmed === '' ? null : trimmed;
}

/** Today's date where the user is, as the API writes dates: "2026-03-31". */
export function todayIso(): string {
  const now = new Date();
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** A date some days from today, "2026-04-30". */
export function daysFromToday(days: number): string {
  const at = new Date();
  at.setDate(at.getDate() + days);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${at.getFullYear()}-${pad(at.getMonth() + 1)}-${pad(at.getDate())}`;
}

/**
 * A resolver that checks the form with the API's own schema: the form's text fields are turned
 * into the request body by `toRequest`, and the schema's messages land on the form's fields. The
 * values handed to the submit handler are the form's own; the handler builds the body again.
 */
export function requestResolver<F extends FieldValues>(
  schema: z.ZodType,
  toRequest: (values: F) => unknown,
  /** Words for a field left empty, where the schema's own message speaks of types or ids. */
  emptyMessages: Partial<Record<string, string>> = {},
): Resolver<F> {
  const checked = z.preprocess((values) => toRequest(values as F), schema);
  const resolve = zodResolver(checked as never, undefined, { raw: true }) as unknown as Resolver<F>;
  return async (values, context, options) => {
    const result = await resolve(values, context, options);
    const errors = collapseMeasurements(result.errors) as Record<string, { message?: string } | undefined>;
    for (const [field, message] of Object.entries(emptyMessages)) {
      const error = errors[field];
      const raw = (values as Record<string, unknown>)[field];
      if (error && message && (raw === '' || raw == null)) error.message = message;
    }
    return { ...result, errors } as typeof result;
  };
}

/** A measurement the form must have: blank stays without a value, so the schema says the field needs a number. */
export function requiredMeasurement<U extends string>(text: string | undefined | null, unit: U): { value: number | undefined; unit: U } {
  return { value: numberOrNull(text) ?? undefined, unit };
}

type ErrorTree = Record<string, unknown>;

/** A measurement is one field on the form: its `value` and `unit` messages belong to the field itself. */
function collapseMeasurements<T>(errors: T): T {
  const walk = (node: unknown): unknown => {
    if (!node || typeof node !== 'object') return node;
    const tree = node as ErrorTree;
    if ('message' in tree && 'type' in tree) return tree;
    const part = (tree.value ?? tree.unit) as ErrorTree | undefined;
    if (part && typeof part === 'object' && 'message' in part) return part;
    return Object.fromEntries(Object.entries(tree).map(([key, child]) => [key, walk(child)]));
  };
  return walk(errors) as T;
}

/** Whether the server refused because the key was used for another body: an earlier try reached it after all. */
export function submittedEarlier(error: unknown): boolean {
  return isApiError(error) && error.code === 'submission_key_reused';
}
