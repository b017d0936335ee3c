import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { isApiError } from '../../lib/api-client';
import { buttonClasses } from '../ui/button';
import { FullPageMessage } from './full-page-message';

/** The router's error element: not-found pages, and anything a loader or page threw. */
export function RouteError({ homeHref, inShell = false }: { homeHref: string; inShell?: boolean }) {
  const error = useRouteError();
  const status = isRouteErrorResponse(error)
    ? error.status
    : isApiError(error)
      ? error.status
      : null;

  if (status === 404) return <NotFound homeHref={homeHref} inShell={inShell} />;

  const offline = isApiError(error) && error.code === 'unreachable';
  return (
    <FullPageMessage
      inShell={inShell}
      icon="error"
      title={offline ? "Can't reach Hourstone" : 'Something went wrong'}
      actions={
        <>
          <button
            type="button"
            className={buttonClasses('primary')}
            onClick={() => window.location.reload()}
          >
            Reload the page
          </button>
          <Link to={homeHref} className={buttonClasses('secondary')}>
            Go to start
          </Link>
        </>
      }
    >
      <p>
        {isApiError(error)
          ? error.message
          : 'The page stopped working. Reloading usually helps; nothing you saved is lost.'}
      </p>
    </FullPageMessage>
  );
}

export function NotFound({ homeHref, inShell = false }: { homeHref: string; inShell?: boolean }) {
  return (
    <FullPageMessage
      inShell={inShell}
      icon="field"
      title="Nothing here"
      actions={
        <Link to={homeHref} className={buttonClasses('primary')}>
          Go to start
        </Link>
      }
    >
      <p>This page doesn't exist, or it belongs to an organization you're not a member of.</p>
    </FullPageMessage>
  );
}
