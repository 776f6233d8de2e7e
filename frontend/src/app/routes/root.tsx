import { Navigate, Outlet, ScrollRestoration, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useAppMeta } from '@/lib/app-meta';
import { ErrorState } from '@/components/ui/error-state';
import { FullPageSpinner } from '@/components/ui/spinner';

/** Learns the app's mode first; a production installation without an administrator goes to set-up. */
export function RootLayout() {
  const meta = useAppMeta();
  const location = useLocation();

  if (meta.isPending) return <FullPageSpinner label="Starting Ferrule…" />;
  if (meta.isError) {
    return (
      <main className="mx-auto flex min-h-dvh max-w-lg items-center p-6">
        <ErrorState
          headingLevel={1}
          title="Ferrule's server could not be reached"
          error={meta.error}
          onRetry={() => void meta.refetch()}
          retrying={meta.isFetching}
          className="w-full"
        />
      </main>
    );
  }
  if (meta.data.needsSetup && location.pathname !== paths.auth.setup.path) {
    return <Navigate to={paths.auth.setup.getHref()} replace />;
  }

  return (
    <>
      <ScrollRestoration />
      <Outlet />
    </>
  );
}
