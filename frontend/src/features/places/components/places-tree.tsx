import { useCallback, useMemo, useState } from 'react';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import type { SiteDto } from '@shared/schemas/register.schema';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { EmptyState } from '@/components/ui/empty-state';
import { PlusIcon } from '@/components/ui/icons';
import { useToast } from '@/components/ui/toast';
import { SiteBranch } from './site-branch';
import { SiteFormDialog } from './site-form-dialog';
import { TreeContext, type TreeState } from './tree-parts';

interface PlacesTreeProps {
  sites: SiteSummary[];
  /** The site to open first, from the address. */
  initialSiteId?: string;
  /** A site was added or changed: the list of sites is out of date. */
  onSitesChanged: (site: SiteDto) => void;
}

/** Sites → areas → equipment → positions, each branch opened on demand. */
export function PlacesTree({ sites, initialSiteId, onSitesChanged }: PlacesTreeProps) {
  const user = useCurrentUser();
  const toast = useToast();
  const [openKeys, setOpenKeys] = useState<ReadonlySet<string>>(() => {
    const first = initialSiteId ?? (sites.length === 1 ? sites[0]?.id : undefined);
    return new Set(first ? [`site:${first}`] : []);
  });
  const [showArchived, setShowArchived] = useState(false);
  const [adding, setAdding] = useState(false);

  const toggle = useCallback(
    (key: string) =>
      setOpenKeys((current) => {
        const next = new Set(current);
        if (next.has(key)) next.delete(key);
        else next.add(key);
        return next;
      }),
    [],
  );
  const expand = useCallback((key: string) => setOpenKeys((current) => (current.has(key) ? current : new Set([...current, key]))), []);
  const tree: TreeState = useMemo(
    () => ({ isOpen: (key) => openKeys.has(key), toggle, expand, archived: showArchived ? 'include' : 'exclude' }),
    [openKeys, toggle, expand, showArchived],
  );
  const canAddSite = hasAbility(user, 'sites.create');
  const addSiteButton = canAddSite ? (
    <Button icon={<PlusIcon />} onClick={() => setAdding(true)}>
      Add site
    </Button>
  ) : null;

  return (
    <TreeContext value={tree}>
      <div className="flex flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <Checkbox label="Show archived areas and equipment" checked={showArchived} onChange={(event) => setShowArchived(event.target.checked)} />
          <div className="flex flex-wrap gap-2">
            <Button variant="ghost" onClick={() => setOpenKeys(new Set())} disabled={openKeys.size === 0}>
              Close all
            </Button>
            {addSiteButton}
          </div>
        </div>
        {sites.length === 0 ? (
          <EmptyState title="No sites yet" action={addSiteButton}>
            {canAddSite
              ? 'Add the first mine, quarry or plant. Its areas, equipment and hose positions go under it.'
              : user.allSites
                ? 'No site has been set up yet. An administrator adds sites.'
                : 'You have not been given any site. Ask an administrator for access to the sites you work at.'}
          </EmptyState>
        ) : (
          <ul className="flex flex-col gap-3" aria-label="Sites">
            {sites.map((site) => (
              <SiteBranch key={site.id} site={site} onSiteSaved={onSitesChanged} />
            ))}
          </ul>
        )}
      </div>
      {adding ? (
        <SiteFormDialog
          open
          onClose={() => setAdding(false)}
          onSaved={(saved) => {
            setAdding(false);
            toast.show({ title: `${saved.name} added`, description: 'It has every service of the catalogue at its defaults.' });
            expand(`site:${saved.id}`);
            onSitesChanged(saved);
          }}
        />
      ) : null}
    </TreeContext>
  );
}
