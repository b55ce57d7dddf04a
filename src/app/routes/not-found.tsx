import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/ui/states';

export function NotFoundRoute() {
  return (
    <EmptyState title="There is no page at this address">
      <Link to="/">Go to the overview</Link>
    </EmptyState>
  );
}
