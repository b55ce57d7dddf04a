import { useParams } from 'react-router-dom';
import { DossierScreen } from '@/features/shortlists/components/dossier-screen';
import { Wordmark } from '../layout/wordmark';

export function ShortlistDossierRoute() {
  const { id } = useParams();
  return <DossierScreen shortlistId={Number(id)} brand={<Wordmark />} />;
}
