import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SetupInput } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { metaKeys } from '@/lib/query-keys';

/** Creates the first administrator of a production installation. */
export function setUp(input: SetupInput): Promise<void> {
  return api.post<void>('/api/setup', input).then(() => undefined);
}

export function useSetUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setUp,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: metaKeys.all });
    },
  });
}
