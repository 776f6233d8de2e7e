import type { UserStatus } from '@shared/schemas/users.schema';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { STATUS_LABELS } from './user-labels';

const TONES: Record<UserStatus, BadgeTone> = { active: 'success', invited: 'accent', expired: 'danger', inactive: 'muted' };

export function UserStatusBadge({ status }: { status: UserStatus }) {
  return <Badge tone={TONES[status]}>{STATUS_LABELS[status]}</Badge>;
}
