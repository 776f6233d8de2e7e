import { NavLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';

const TABS = [
  { label: 'Hose constructions', to: paths.catalogue.constructions.getHref(), match: paths.catalogue.constructions.path },
  { label: 'End fittings', to: paths.catalogue.fittings.getHref(), match: paths.catalogue.fittings.path },
  { label: 'Services', to: paths.catalogue.services.getHref(), match: paths.catalogue.services.path },
] as const;

/** The three parts of the catalogue, as a switch above each of them; the current one is marked. */
export function CatalogueTabs({ siteId }: { siteId?: string }) {
  return (
    <nav aria-label="Catalogue" className="mb-2">
      <ul className="grid grid-cols-3 gap-1 rounded-[var(--radius-card)] border border-ink-200 bg-white p-1 shadow-sm sm:inline-flex">
        {TABS.map((tab) => (
          <li key={tab.match}>
            <NavLink
              to={tab.match === paths.catalogue.services.path ? paths.catalogue.services.getHref(siteId) : tab.to}
              className={({ isActive }) =>
                cn(
                  'flex h-full min-h-12 items-center justify-center rounded-[var(--radius-control)] px-2 text-center leading-tight font-semibold sm:px-4 sm:whitespace-nowrap',
                  isActive ? 'bg-ink-900 text-white' : 'text-ink-800 hover:bg-ink-100',
                )
              }
            >
              {tab.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
