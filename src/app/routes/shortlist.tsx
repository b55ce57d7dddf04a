import { useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/states';
import { useSession } from '@/features/auth/api/get-session';
import { withProgramme } from '@/features/programmes';
import { ShortlistDetail } from '@/features/shortlists/components/shortlist-detail';

export function ShortlistRoute() {
  const { data: user } = useSession();
  const { id } = useParams();
  const navigate = useNavigate();
  const shortlistId = Number(id);
  if (!user) return null;
  if (!Number.isInteger(shortlistId) || shortlistId <= 0) return <EmptyState title="There is no shortlist at this address" />;
  return (
    <ShortlistDetail
      key={shortlistId}
      id={shortlistId}
      user={user}
      listHref={(programmeId) => withProgramme('/shortlists', programmeId)}
      onArchived={(shortlist) => navigate(withProgramme('/shortlists', shortlist.programmeId), { state: { notice: `Archived “${shortlist.title}”. It stays on record.` } })}
      // The map of the shortlist's recipes mounts here: mapSlot={(shortlist) => <map of shortlist.items for shortlist.programmeId />}
    />
  );
}
