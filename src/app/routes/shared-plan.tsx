import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { Brand } from '../../components/layouts/brand';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { sharedPlanQueryOptions } from '../../features/share/api/share-links';
import { SharedPlanView } from '../../features/share/components/shared-plan-view';
import { isApiError } from '../../lib/api-client';

/** `/share/:token`: one cut plan, read-only, for someone without an account. */
export function SharedPlanRoute() {
  const token = useParams().token ?? '';
  const plan = useQuery(sharedPlanQueryOptions(token));
  return (
    <div className="min-h-screen">
      <meta name="referrer" content="no-referrer" />
      <meta name="robots" content="noindex" />
      <header className="border-b border-zinc-200 bg-white">
        <div className="mx-auto flex h-14 max-w-[1400px] items-center gap-4 px-6">
          <Brand />
          <span className="text-sm text-zinc-500">Shared cut plan · read-only</span>
        </div>
      </header>
      <main className="mx-auto max-w-[1400px] px-6 py-8">
        <title>{`${plan.data?.buildName ?? 'Shared cut plan'} · Boxwright`}</title>
        {plan.isPending ? <p className="text-sm text-zinc-500">Opening the cut plan…</p> : null}
        {plan.isError ? (
          <Alert
            tone={isApiError(plan.error) && plan.error.status === 0 ? 'warning' : 'error'}
            title="This link cannot be opened"
            actions={isApiError(plan.error) && plan.error.status === 0 ? <Button onClick={() => plan.refetch()}>Try again</Button> : undefined}
          >
            {isApiError(plan.error) ? plan.error.message : 'Please try again.'}{' '}
            {isApiError(plan.error) && plan.error.status !== 0 ? 'Shared links expire and can be withdrawn: ask the person who sent it for a new one.' : ''}
          </Alert>
        ) : null}
        {plan.data ? (
          <>
            <h1 className="mb-1 text-xl font-bold text-zinc-900">{plan.data.buildName}</h1>
            <p className="mb-6 text-sm text-zinc-500">{plan.data.cabinets.map((c) => `${c.name} × ${c.count}${c.mirrored ? ' (mirrored pair)' : ''}`).join(' · ')}</p>
            <SharedPlanView token={token} plan={plan.data} />
          </>
        ) : null}
      </main>
    </div>
  );
}
