import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { errorMessage } from '@/lib/api';

function isChunkLoadError(error: unknown): boolean {
  return error instanceof Error && /dynamically imported module|Importing a module script failed|Failed to fetch/i.test(error.message);
}

/** Shown when a route throws or its code fails to load; keeps a way home. */
export function RouteError() {
  const error = useRouteError();
  let title = 'Something went wrong';
  let message = errorMessage(error);
  if (isRouteErrorResponse(error)) {
    title = error.status === 404 ? 'Page not found' : `Error ${error.status}`;
    message = error.statusText || message;
  } else if (isChunkLoadError(error)) {
    title = 'Windway has been updated';
    message = 'This page could not be loaded, probably because a newer version was published. Reload to continue.';
  }
  return (
    <div className="mx-auto max-w-reading px-4 py-16">
      <title>{`${title} · Windway`}</title>
      <Alert tone="danger" title={title} role="alert">
        <p>{message}</p>
      </Alert>
      <div className="mt-6 flex gap-4">
        <Button variant="secondary" onClick={() => window.location.reload()}>
          Reload
        </Button>
        <Link to="/" reloadDocument className="self-center">
          Go to the home page
        </Link>
      </div>
    </div>
  );
}
