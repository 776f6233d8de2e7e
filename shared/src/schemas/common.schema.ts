import { z } from 'zod';

export const uuidSchema = z.uuid({ message: 'Must be an id (UUID)' });
export const idParamsSchema = z.strictObject({ id: uuidSchema });

export const emailSchema = z
  .string({ message: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail is at most 254 characters')
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));

export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(100000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});

export interface Pagination {
  page: number;
  pageSize: number;
  total: number;
}

export interface ListResponse<T> {
  data: T[];
  pagination: Pagination;
}

export interface ApiErrorBody {
  error: { code: string; message: string; field?: string };
}
