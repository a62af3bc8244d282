import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { isApiError } from '../../lib/api-client';
import { buttonClasses } from '../ui/button';

function describe(error: unknown): { title: string; message: string } {
  const status = isApiError(error) ? error.status : isRouteErrorResponse(error) ? error.status : undefined;
  if (status === 404) return { title: 'Not found', message: 'This page or item does not exist, or it was deleted.' };
  if (status === 403)
    return { title: 'No access', message: 'Your role in this workshop does not allow this, or you are not a member of it.' };
  if (isApiError(error)) return { title: 'Could not load this page', message: error.message };
  return { title: 'Something went wrong', message: 'This page stopped working. Reloading usually helps.' };
}

/** A route's errorElement: says calmly what happened and offers a way on. */
export function RouteError() {
  const error = useRouteError();
  const { title, message } = describe(error);
  if (!isApiError(error) && !isRouteErrorResponse(error)) console.error(error);
  return (
    <div className="mx-auto max-w-lg px-6 py-24 text-center">
      <h1 className="text-xl font-bold text-zinc-900">{title}</h1>
      <p className="mt-2 text-sm text-zinc-600">{message}</p>
      <div className="mt-6 flex justify-center gap-2">
        <Link to="/" className={buttonClasses('primary')}>
          Go to start
        </Link>
        <button type="button" className={buttonClasses('secondary')} onClick={() => window.location.reload()}>
          Reload
        </button>
      </div>
    </div>
  );
}
