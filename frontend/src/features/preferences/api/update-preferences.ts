import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeDto, Preferences } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { meKeys } from '@/lib/query-keys';

export function updatePreferences(input: Preferences): Promise<MeDto> {
  return api.put<{ data: MeDto }>('/api/me/preferences', input).then((body) => body.data);
}

export function useUpdatePreferences({ onSuccess }: { onSuccess?: (me: MeDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onSuccess: (me) => {
      queryClient.setQueryData(meKeys.all, me);
      onSuccess?.(me);
    },
  });
}
