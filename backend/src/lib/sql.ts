/**
 * The rows of an UPDATE or DELETE … RETURNING run through TypeORM's `query()`, which answers
 * those statements with `[rows, affectedCount]` rather than the rows themselves.
 */
export function returnedRows<T>(result: unknown): T[] {
  if (Array.isArray(result) && result.length === 2 && Array.isArray(result[0]) && typeof result[1] === 'number') return result[0] as T[];
  return result as T[];
}
