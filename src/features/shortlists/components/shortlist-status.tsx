import type { ShortlistStatus } from '@shared/states';
import { Badge } from '@/components/ui/page';

export const STATUS_LABELS: Record<ShortlistStatus, string> = {
  draft: 'Draft',
  submitted: 'Waiting for review',
  approved: 'Approved',
  returned: 'Returned for changes',
};

/** The order a team reads them in: what waits for a decision first. */
export const STATUS_ORDER: readonly ShortlistStatus[] = ['submitted', 'draft', 'returned', 'approved'];

const TONES = { draft: 'neutral', submitted: 'amber', approved: 'leaf', returned: 'brick' } as const;

export function StatusBadge({ status }: { status: ShortlistStatus }) {
  return <Badge tone={TONES[status]}>{STATUS_LABELS[status]}</Badge>;
}
