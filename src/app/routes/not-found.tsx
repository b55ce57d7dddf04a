import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page';
import { EmptyState } from '@/components/ui/states';

export function NotFoundRoute() {
  return (
    <>
      <PageHeader title="Page not found" />
      <EmptyState title="There is no page at this address">
        <Link to="/">Go to the overview</Link>
      </EmptyState>
    </>
  );
}
