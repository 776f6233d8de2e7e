import type { Preferences } from '@shared/schemas/auth.schema';
import { useCurrentUser } from '@/lib/auth';

/** The units the signed-in user reads and types quantities in. */
export function useUnits(): Preferences {
  return useCurrentUser().preferences;
}
