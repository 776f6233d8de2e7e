import { useId, useState } from 'react';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import type { SiteDto } from '@shared/schemas/register.schema';
import { LENGTH_UNIT_SYMBOLS, PRESSURE_UNIT_SYMBOLS, TEMPERATURE_UNIT_SYMBOLS } from '@shared/units/units';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { PlusIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useToast } from '@/components/ui/toast';
import { useAreas } from '../api/get-areas';
import { useSite } from '../api/get-site';
import { AreaBranch } from './area-branch';
import { AreaFormDialog } from './area-form-dialog';
import { SiteFormDialog } from './site-form-dialog';
import { BranchBody, BranchEmpty, BranchToggle, ShowMore, useTree } from './tree-parts';

interface SiteBranchProps {
  site: SiteSummary;
  onSiteSaved: (site: SiteDto) => void;
}

/** One site: open it for its settings and its areas. */
export function SiteBranch({ site, onSiteSaved }: SiteBranchProps) {
  const tree = useTree();
  const bodyId = useId();
  const key = `site:${site.id}`;
  const open = tree.isOpen(key);

  return (
    <li className="rounded-[var(--radius-card)] border border-ink-200 bg-white p-2 shadow-sm sm:p-3">
      <BranchToggle level="site" open={open} onToggle={() => tree.toggle(key)} controls={bodyId} code={site.code} name={site.name} />
      {open ? (
        <BranchBody id={bodyId} className="gap-4">
          <PanelBoundary title="The site's settings could not be shown">
            <SiteSettings siteId={site.id} onSaved={onSiteSaved} />
          </PanelBoundary>
          <PanelBoundary title="The areas could not be shown">
            <SiteAreas site={site} />
          </PanelBoundary>
        </BranchBody>
      ) : null}
    </li>
  );
}

function SiteSettings({ siteId, onSaved }: { siteId: string; onSaved: (site: SiteDto) => void }) {
  const site = useSite(siteId);
  const toast = useToast();
  const [editing, setEditing] = useState(false);

  if (site.isPending) return <SkeletonBlock label="Loading the site's settings…" lines={1} />;
  if (site.isError) return <ErrorState title="The site's settings could not be loaded" error={site.error} onRetry={() => void site.refetch()} retrying={site.isFetching} />;

  const s = site.data;
  const units = `${PRESSURE_UNIT_SYMBOLS[s.defaultUnits.pressureUnit]}, ${LENGTH_UNIT_SYMBOLS[s.defaultUnits.lengthUnit]}, ${TEMPERATURE_UNIT_SYMBOLS[s.defaultUnits.temperatureUnit]}`;
  return (
    <div className="flex flex-wrap items-center justify-between gap-3 rounded-[var(--radius-control)] bg-ink-50 px-3 py-2">
      <dl className="flex flex-wrap gap-x-6 gap-y-1 text-sm" aria-label={`Settings of ${s.name}`}>
        <div className="flex gap-1.5">
          <dt className="text-ink-600">Time zone</dt>
          <dd className="font-semibold text-ink-950">{s.timeZone}</dd>
        </div>
        <div className="flex gap-1.5">
          <dt className="text-ink-600">Currency</dt>
          <dd className="font-semibold text-ink-950">{s.currency}</dd>
        </div>
        <div className="flex gap-1.5">
          <dt className="text-ink-600">Default units</dt>
          <dd className="font-semibold text-ink-950">{units}</dd>
        </div>
        {s.archivedAt ? (
          <div>
            <dt className="sr-only">Status</dt>
            <dd>
              <Badge tone="muted">Archived</Badge>
            </dd>
          </div>
        ) : null}
      </dl>
      {s.abilities.update ? (
        <Button variant="secondary" onClick={() => setEditing(true)} aria-label={`Edit site ${s.name}`}>
          Edit site
        </Button>
      ) : null}
      {editing ? (
        <SiteFormDialog
          open
          onClose={() => setEditing(false)}
          site={s}
          onSaved={(saved) => {
            setEditing(false);
            toast.show({ title: `${saved.name} saved` });
            onSaved(saved);
          }}
        />
      ) : null}
    </div>
  );
}

function SiteAreas({ site }: { site: SiteSummary }) {
  const user = useCurrentUser();
  const tree = useTree();
  const toast = useToast();
  const areas = useAreas(site.id, tree.archived);
  const [adding, setAdding] = useState(false);
  const canAdd = hasAbility(user, 'areas.edit');
  const addButton = canAdd ? (
    <Button variant="secondary" icon={<PlusIcon />} onClick={() => setAdding(true)}>
      Add area
    </Button>
  ) : null;

  let list;
  if (areas.isPending) list = <SkeletonBlock label={`Loading the areas of ${site.name}…`} lines={3} />;
  else if (areas.isError) list = <ErrorState title="The areas could not be loaded" error={areas.error} onRetry={() => void areas.refetch()} retrying={areas.isFetching} />;
  else {
    const rows = areas.data.pages.flatMap((page) => page.data);
    const total = areas.data.pages.at(-1)?.pagination.total ?? rows.length;
    list =
      rows.length === 0 ? (
        <BranchEmpty>No areas at {site.name} yet.{canAdd ? ' Add the pits, plants and workshops where its equipment works.' : ''}</BranchEmpty>
      ) : (
        <>
          <ul className="flex flex-col gap-1" aria-label={`Areas of ${site.name}`}>
            {rows.map((area) => (
              <AreaBranch key={area.id} area={area} siteName={site.name} />
            ))}
          </ul>
          <ShowMore shown={rows.length} total={total} noun="areas" onMore={() => void areas.fetchNextPage()} loading={areas.isFetchingNextPage} />
        </>
      );
  }

  return (
    <div className="flex flex-col gap-2">
      {list}
      {addButton ? <div>{addButton}</div> : null}
      {adding ? (
        <AreaFormDialog
          open
          onClose={() => setAdding(false)}
          siteId={site.id}
          siteName={site.name}
          onSaved={(saved) => {
            setAdding(false);
            toast.show({ title: `${saved.name} added to ${site.name}` });
            tree.expand(`area:${saved.id}`);
          }}
        />
      ) : null}
    </div>
  );
}
