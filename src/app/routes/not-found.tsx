import { Link } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { paths } from '../../config/paths';

export function NotFoundRoute() {
  return (
    <div className="mx-auto max-w-lg px-6 py-24 text-center">
      <title>Page not found · Boxwright</title>
      <h1 className="text-xl font-bold text-zinc-900">Page not found</h1>
      <p className="mt-2 text-sm text-zinc-600">There is no page at this address.</p>
      <Link to={paths.home.getHref()} className={buttonClasses('primary', 'md', 'mt-6')}>
        Go to start
      </Link>
    </div>
  );
}
