import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteDetailKeys } from './place-keys';

/** A site's settings: time zone, currency and default units. */
export function getSite(id: string, signal?: AbortSignal): Promise<SiteDto> {
  return api.get<{ data: SiteDto }>(`/api/sites/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const siteQueryOptions = (id: string) => queryOptions({ queryKey: siteDetailKeys.detail(id), queryFn: ({ signal }) => getSite(id, signal) });

export function useSite(id: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...siteQueryOptions(id), enabled });
}
