import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';

/**
 * What a route shows when it fails to load or render. Plain markup: it sits on the
 * first-load path and must work even when a chunk of the app itself failed to load.
 */
export function RouteError() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  // A deploy replaces the chunks the code is split into; a page opened before it then fails to load one.
  const chunkFailed = error instanceof TypeError && /dynamically imported module|Importing a module script failed|Failed to fetch/i.test(error.message);
  return (
    <div role="alert" className="route-error">
      <h1>{notFound ? 'There is no page at this address' : 'This page could not be shown'}</h1>
      <p>
        {notFound
          ? 'Check the address, or start again from the home page.'
          : chunkFailed
            ? 'Causeway has been updated since this page was opened. Reload to get the new version.'
            : 'Something went wrong. Reloading often helps.'}
      </p>
      <p className="route-error-actions">
        {!notFound && (
          <button type="button" className="route-error-button" onClick={() => window.location.reload()}>
            Reload
          </button>
        )}
        <a href={paths.home}>Go to the home page</a>
      </p>
    </div>
  );
}
