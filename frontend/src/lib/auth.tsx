import { createContext, useContext, type ReactNode } from 'react';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { Navigate, useLocation } from 'react-router-dom';
import type { MeDto } from '@shared/schemas/auth.schema';
import { mayGrantSites, type Action, type SiteAccess } from '@shared/permissions';
import { paths } from '@/config/paths';
import { TextLink } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { FullPageSpinner } from '@/components/ui/spinner';
import { api, isApiError } from './api-client';
import { meKeys } from './query-keys';

export function getMe(signal?: AbortSignal): Promise<MeDto> {
  return api.get<{ data: MeDto }>('/api/auth/me', undefined, signal).then((body) => body.data);
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: meKeys.all,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
    retry: (failureCount, error) => !isApiError(error) && failureCount < 2,
  });

export function useMe() {
  return useQuery(meQueryOptions());
}

const CurrentUserContext = createContext<MeDto | null>(null);

/** The signed-in user, inside the part of the app that needs one. */
export function useCurrentUser(): MeDto {
  const user = useContext(CurrentUserContext);
  if (!user) throw new Error('useCurrentUser is only available inside RequireAuth');
  return user;
}

/** Whether the server granted the user this action. The client never works it out from the role. */
export function hasAbility(user: Pick<MeDto, 'abilities'>, action: Action): boolean {
  return user.abilities.includes(action);
}

export function siteAccessOf(user: Pick<MeDto, 'allSites' | 'sites'>): SiteAccess {
  return { allSites: user.allSites, siteIds: user.sites.map((site) => site.id) };
}

/** Whether the user may hand out "all sites": only one who has all sites may (the server checks again). */
export function mayGrantAllSites(user: Pick<MeDto, 'allSites' | 'sites'>): boolean {
  return mayGrantSites(siteAccessOf(user), { allSites: true, siteIds: [] });
}

export function CurrentUserProvider({ user, children }: { user: MeDto; children: ReactNode }) {
  return <CurrentUserContext value={user}>{children}</CurrentUserContext>;
}

/** Shows its children to a signed-in user; sends anyone else to sign in, keeping where they were going. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) return <FullPageSpinner label="Loading your account…" />;

  if (me.isError) {
    if (isApiError(me.error) && me.error.status === 401) {
      return <Navigate to={paths.auth.signIn.getHref(location.pathname + location.search)} replace />;
    }
    return (
      <main className="mx-auto flex min-h-dvh max-w-lg items-center p-6">
        <ErrorState
          headingLevel={1}
          title="Your account could not be loaded"
          error={me.error}
          onRetry={() => void me.refetch()}
          retrying={me.isFetching}
          className="w-full"
        />
      </main>
    );
  }

  return <CurrentUserProvider user={me.data}>{children}</CurrentUserProvider>;
}

/** Shows its children only to a user with the ability; anyone else gets a plain "no access" screen. */
export function RequireAbility({ action, children }: { action: Action; children: ReactNode }) {
  const user = useCurrentUser();
  if (hasAbility(user, action)) return <>{children}</>;
  return <AccessDenied />;
}

export function AccessDenied() {
  return (
    <div className="flex flex-col gap-4">
      <title>No access · Ferrule</title>
      <h1 className="text-2xl font-bold text-ink-950">You don't have access to this page</h1>
      <p className="max-w-prose text-ink-700">
        Your role does not include this part of Ferrule. If you need it for your work, ask an administrator at your plant.
      </p>
      <p>
        <TextLink to={paths.home.getHref()}>Go to your home page</TextLink>
      </p>
    </div>
  );
}
