import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';
import { meKeys } from './query-keys';

const isClientError = (error: unknown) => isApiError(error) && error.status >= 400 && error.status < 500;

/**
 * One client per app. A 401 on any call other than the session check means the session ended:
 * the session check runs again, fails, and the app sends the person to the sign-in page.
 */
export function createQueryClient(): QueryClient {
  const handleUnauthenticated = (error: unknown, key?: readonly unknown[]) => {
    if (!isApiError(error) || error.status !== 401) return;
    if (key && key[0] === meKeys.all[0]) return;
    void client.invalidateQueries({ queryKey: meKeys.all });
  };

  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => handleUnauthenticated(error, query.queryKey) }),
    mutationCache: new MutationCache({ onError: (error) => handleUnauthenticated(error) }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Poor signal in the field makes a retry worth it; a 4xx will answer the same again.
        retry: (failureCount, error) => !isClientError(error) && failureCount < 2,
      },
      mutations: { retry: false },
    },
  });
  return client;
}
