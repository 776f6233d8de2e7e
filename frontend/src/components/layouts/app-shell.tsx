import { useState, type ReactNode } from 'react';
import { NavLink, useLocation } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/roles';
import type { AppMetaDto, MeDto } from '@shared/schemas/auth.schema';
import { cn } from '@/lib/cn';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { AccountIcon, SignOutIcon } from '@/components/ui/icons';
import { Brand } from './brand';
import { DemoBanner } from './demo-banner';
import { navItemsFor } from './main-nav';

interface AppShellProps {
  user: MeDto;
  meta: AppMetaDto;
  onSignOut: () => void;
  signingOut?: boolean;
  children: ReactNode;
}

/**
 * The frame of every signed-in page: a side bar on a desktop, and on a phone a header and a bottom
 * bar within thumb reach. Both are the "Main" navigation; only one shows at a time.
 */
export function AppShell({ user, meta, onSignOut, signingOut, children }: AppShellProps) {
  const items = navItemsFor(user);
  const inSection = useInSection();
  const demo = meta.mode === 'demo';

  return (
    <div className="min-h-dvh bg-ink-50">
      <a
        href="#main"
        className="sr-only z-[70] rounded-[var(--radius-control)] bg-white px-4 py-3 font-semibold text-ink-950 focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>

      <aside className="on-dark fixed inset-y-0 left-0 z-30 hidden w-64 flex-col bg-ink-950 text-white md:flex">
        <div className="flex flex-col gap-3 px-5 pt-5 pb-4">
          <Brand companyName={meta.companyName} />
        </div>
        <nav aria-label="Main" className="flex-1 px-3 py-2">
          <ul className="flex flex-col gap-1">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.end}
                  className={({ isActive }) =>
                    cn(
                      'flex min-h-12 items-center gap-3 rounded-[var(--radius-control)] border-l-4 px-3 font-semibold',
                      isActive || inSection(item.section) ? 'border-copper-400 bg-ink-800 text-white' : 'border-transparent text-ink-200 hover:bg-ink-900 hover:text-white',
                    )
                  }
                >
                  <item.icon className="shrink-0" />
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="flex flex-col gap-3 border-t border-ink-800 px-5 py-4">
          <div className="flex flex-col">
            <span className="font-semibold text-white">{user.name}</span>
            <span className="text-sm text-ink-200">{ROLE_LABELS[user.role]}</span>
          </div>
          <Button variant="on-dark" onClick={onSignOut} loading={signingOut} icon={<SignOutIcon />}>
            Sign out
          </Button>
        </div>
      </aside>

      <header className="on-dark sticky top-0 z-20 flex items-center justify-between gap-3 bg-ink-950 px-4 py-3 md:hidden">
        <Brand companyName={meta.companyName} />
      </header>

      <div className="md:pl-64">
        {demo ? <DemoBanner /> : null}
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl px-4 pt-6 pb-28 focus:outline-none md:px-8 md:pt-8 md:pb-12">
          {children}
        </main>
      </div>

      <PhoneBar user={user} items={items} onSignOut={onSignOut} signingOut={signingOut} />
    </div>
  );
}

function PhoneBar({ user, items: allItems, onSignOut, signingOut }: { user: MeDto; items: ReturnType<typeof navItemsFor>; onSignOut: () => void; signingOut?: boolean }) {
  const [accountOpen, setAccountOpen] = useState(false);
  // The bar holds the few places a fitter goes in the field; the rest are one tap away under "More".
  const items = allItems.filter((item) => item.phone);
  const inSection = useInSection();
  const more = allItems.filter((item) => !item.phone);
  const itemClasses = 'flex min-h-16 min-w-11 flex-1 flex-col items-center justify-center gap-0.5 px-1 text-xs font-semibold';

  return (
    <nav aria-label="Main" className="on-dark fixed inset-x-0 bottom-0 z-30 border-t border-ink-800 bg-ink-950 pb-[env(safe-area-inset-bottom)] md:hidden">
      <ul className="flex">
        {items.map((item) => (
          <li key={item.to} className="flex flex-1">
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                cn(itemClasses, 'border-t-4', isActive || inSection(item.section) ? 'border-copper-400 text-white' : 'border-transparent text-ink-200 hover:text-white')
              }
            >
              <item.icon className="size-6" />
              {item.shortLabel}
            </NavLink>
          </li>
        ))}
        <li className="flex flex-1">
          <button
            type="button"
            onClick={() => setAccountOpen(true)}
            aria-haspopup="dialog"
            className={cn(itemClasses, 'border-t-4 border-transparent text-ink-200 hover:text-white')}
          >
            <AccountIcon className="size-6" />
            More
          </button>
        </li>
      </ul>
      <Dialog open={accountOpen} onClose={() => setAccountOpen(false)} title="More" size="sm">
        <div className="flex flex-col gap-4">
          {more.length ? (
            <ul className="flex flex-col gap-1" aria-label="More places">
              {more.map((item) => (
                <li key={item.to}>
                  <NavLink
                    to={item.to}
                    end={item.end}
                    onClick={() => setAccountOpen(false)}
                    className="flex min-h-12 items-center gap-3 rounded-[var(--radius-control)] px-3 font-semibold text-ink-900 hover:bg-ink-100"
                  >
                    <item.icon className="shrink-0" />
                    {item.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          ) : null}
          <dl className="flex flex-col gap-2">
            <div>
              <dt className="text-sm text-ink-600">Signed in as</dt>
              <dd className="font-semibold text-ink-950">{user.name}</dd>
              <dd className="break-all text-ink-700">{user.email}</dd>
            </div>
            <div>
              <dt className="text-sm text-ink-600">Role</dt>
              <dd className="font-semibold text-ink-950">{ROLE_LABELS[user.role]}</dd>
            </div>
          </dl>
          <Button variant="primary" size="lg" onClick={onSignOut} loading={signingOut} icon={<SignOutIcon />} className="w-full">
            Sign out
          </Button>
        </div>
      </Dialog>
    </nav>
  );
}

/** Whether the current page lies under a navigation item's section (e.g. every page of the catalogue). */
function useInSection() {
  const { pathname } = useLocation();
  return (section: string | undefined) => !!section && (pathname === section || pathname.startsWith(`${section}/`));
}
