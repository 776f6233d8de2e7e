import { useId } from 'react';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FieldError } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useSites } from '../api/get-sites';

export interface SitePickerProps {
  value: string[];
  onChange: (siteIds: string[]) => void;
  error?: string;
  disabled?: boolean;
  /** Sites already granted that the signed-in user may not list; kept so they can be seen and removed. */
  extraSites?: SiteSummary[];
}

/** A list of checkboxes, one per site the signed-in user may see. */
export function SitePicker({ value, onChange, error, disabled, extraSites = [] }: SitePickerProps) {
  const sites = useSites();
  const pickerId = useId();
  const errorId = `${pickerId}-error`;

  if (sites.isPending) return <SkeletonBlock label="Loading sites…" lines={3} />;
  if (sites.isError) {
    return <ErrorState title="Sites could not be loaded" error={sites.error} onRetry={() => void sites.refetch()} retrying={sites.isFetching} />;
  }

  const known = new Set(sites.data.map((s) => s.id));
  const options = [...sites.data, ...extraSites.filter((s) => !known.has(s.id))];

  const toggle = (id: string, checked: boolean) => {
    onChange(checked ? [...value.filter((v) => v !== id), id] : value.filter((v) => v !== id));
  };

  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={error ? errorId : undefined} disabled={disabled}>
      <legend className="mb-1 font-semibold text-ink-900">Sites</legend>
      {options.length === 0 ? (
        <EmptyState title="No sites to choose from">No site has been set up yet. Give access to all sites instead, or add a site first.</EmptyState>
      ) : (
        <ul className="grid grid-cols-1 gap-1 sm:grid-cols-2">
          {options.map((site) => {
            const id = `${pickerId}-${site.id}`;
            return (
              <li key={site.id} className="flex min-h-11 items-center gap-3 rounded-[var(--radius-control)] px-2 hover:bg-ink-50">
                <input
                  id={id}
                  type="checkbox"
                  className="size-6 shrink-0 accent-copper-700"
                  checked={value.includes(site.id)}
                  onChange={(event) => toggle(site.id, event.target.checked)}
                  aria-invalid={error ? true : undefined}
                />
                <label htmlFor={id} className="flex min-h-11 flex-1 items-center gap-2 py-2">
                  <span className="font-semibold text-ink-950">{site.name}</span>
                  <span className="font-mono text-sm text-ink-600">{site.code}</span>
                </label>
              </li>
            );
          })}
        </ul>
      )}
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
