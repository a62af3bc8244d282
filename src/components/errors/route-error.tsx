import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { isApiError } from '../../lib/api-client';
import { buttonClasses } from '../ui/button';

/** Plain words for what went wrong: never a stack trace, a status code alone, or the server's raw answer. */
export function describeRouteError(error: unknown): { title: string; message: string; canRetry: boolean } {
  const status = isApiError(error) ? error.status : isRouteErrorResponse(error) ? error.status : undefined;
  if (status === 404) return { title: 'Not found', message: 'This page or item does not exist, or it was deleted.', canRetry: false };
  if (status === 403)
    return { title: 'No access', message: 'Your role in this workshop does not allow this, or you are not a member of it.', canRetry: false };
  if (status === 0)
    return {
      title: 'Could not reach the server',
      message: isApiError(error) ? error.message : 'Check the connection, then reload the page.',
      canRetry: true,
    };
  if (isApiError(error)) return { title: 'Could not load this page', message: error.message, canRetry: error.status >= 500 || error.status === 429 };
  return { title: 'Something went wrong', message: 'This page stopped working. Reloading usually helps.', canRetry: true };
}

/** A route's errorElement: says calmly what happened and offers a way on. */
export function RouteError() {
  const error = useRouteError();
  const { title, message, canRetry } = describeRouteError(error);
  if (!isApiError(error) && !isRouteErrorResponse(error)) console.error(error);
  return (
    <div role="alert" className="mx-auto max-w-lg px-6 py-24 text-center">
      <title>{`${title} · Boxwright`}</title>
      <h1 className="text-xl font-bold text-zinc-900">{title}</h1>
      <p className="mt-2 text-sm text-zinc-600">{message}</p>
      <div className="mt-6 flex justify-center gap-2">
        <Link to="/" className={buttonClasses('primary')}>
          Go to start
        </Link>
        {canRetry ? (
          <button type="button" className={buttonClasses('secondary')} onClick={() => window.location.reload()}>
            Reload
          </button>
        ) : null}
      </div>
    </div>
  );
}
