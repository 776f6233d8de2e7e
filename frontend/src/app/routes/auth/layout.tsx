import { Outlet } from 'react-router-dom';
import { useAppMeta } from '@/lib/app-meta';
import { AuthLayout } from '@/components/layouts/auth-layout';

/** The pages before signing in. The app's mode is already loaded by the root layout. */
export function AuthRouteLayout() {
  const meta = useAppMeta();
  if (!meta.data) return null;
  return (
    <AuthLayout meta={meta.data}>
      <Outlet />
    </AuthLayout>
  );
}
