import { useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/states';
import { useSession } from '@/features/auth/api/get-session';
import { withProgramme } from '@/features/programmes';
import { ShortlistDetail } from '@/features/shortlists/components/shortlist-detail';
import { RecipesMap } from '@/features/map/components/recipes-map';
import { Link } from 'react-router-dom';

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
      mapSlot={(shortlist) => (
        <div className="flex flex-col gap-2">
          <RecipesMap recipes={shortlist.items.map((i) => i.recipe)} title={`shortlist “${shortlist.title}”`} height={380} />
          <p className="text-sm">
            <Link to={`/shortlists/${shortlist.id}/dossier`}>Open the printable dossier</Link> — map, parameters, bench evidence, history and cautions on paper or as PDF.
          </p>
        </div>
      )}
    />
  );
}
