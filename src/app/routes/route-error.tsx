import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';

export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : error instanceof Error ? error.message : 'Unknown error';
  return (
    <div className="p-8">
      <Notice tone="error" title="This page could not be shown">
        <p>{message}</p>
        <p className="mt-2">
          <Link to="/">Back to the overview</Link> or reload the page.
        </p>
      </Notice>
    </div>
  );
}
