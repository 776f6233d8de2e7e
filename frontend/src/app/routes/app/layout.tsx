import { Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { describeError } from '@/lib/api-client';
import { useAppMeta } from '@/lib/app-meta';
import { RequireAuth, useCurrentUser } from '@/lib/auth';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { useToast } from '@/components/ui/toast';
import { AppShell } from '@/components/layouts/app-shell';
import { useSignOut } from '@/features/auth/api/sign-out';

/** Every signed-in page: the shell around it, and a boundary so a failing page leaves the shell working. */
export function AppLayout() {
  return (
    <RequireAuth>
      <SignedInShell />
    </RequireAuth>
  );
}

function SignedInShell() {
  const user = useCurrentUser();
  const meta = useAppMeta();
  const location = useLocation();
  const toast = useToast();
  const signOut = useSignOut({ onSuccess: () => window.location.assign(paths.auth.signIn.getHref()) });

  if (!meta.data) return null;

  return (
    <AppShell
      user={user}
      meta={meta.data}
      signingOut={signOut.isPending}
      onSignOut={() =>
        signOut.mutate(undefined, {
          onError: (error) => toast.show({ tone: 'error', title: 'You are still signed in', description: describeError(error) }),
        })
      }
    >
      <PanelBoundary key={location.pathname} title="This page could not be shown">
        <Outlet />
      </PanelBoundary>
    </AppShell>
  );
}
