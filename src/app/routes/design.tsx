import type { QueryClient } from '@tanstack/react-query';
import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can, type UnitSystem } from '../../../shared/schemas/api.schema';
import { ErrorBoundary } from '../../components/errors/error-boundary';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { ConflictChanges, saveUnits } from '../../features/studio/conflict';
import { Card } from '../../components/ui/card';
import { HistoryList } from '../../components/history/history-list';
import { paths } from '../../config/paths';
import { designQueryOptions } from '../../features/designs/api/get-design';
import { DesignEditor } from '../../features/designs/components/design-editor';
import { formatInches } from '../../../shared/units/index';
import { formatSizeMm } from '../../lib/format';
import { parseId } from './params';
import { useWorkshop } from './workshop';

/** The canvas studio: its own chunk, since konva is large (STACK.md trap 9). */
const DesignStudio = lazy(() => import('../../features/studio'));

/** The design must load before the form can start from it; a 404/403 goes to the route's error view. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(designQueryOptions(parseId(params.workshopId), parseId(params.designId)));
    return null;
  };

export function DesignRoute() {
  const { workshopId, membership } = useWorkshop();
  const designId = parseId(useParams().designId);
  const { data } = useSuspenseQuery(designQueryOptions(workshopId, designId));
  const queryClient = useQueryClient();
  const units: UnitSystem = useMe().data?.user.units ?? 'mm';
  // Kept per user: shown at once, then saved on the account (PATCH /api/auth/me).
  const setUnits = (next: UnitSystem) => {
    const key = meQueryOptions().queryKey;
    queryClient.setQueryData(key, (me) => (me ? { ...me, user: { ...me.user, units: next } } : me));
    saveUnits(next)
      .then((me) => queryClient.setQueryData(key, me))
      .catch(() => void queryClient.invalidateQueries({ queryKey: key }));
  };
  return (
    <>
      <title>{`${data.name} · Boxwright`}</title>
      <DesignEditor
        key={designId}
        workshopId={workshopId}
        initial={data}
        canEdit={can(membership.role, 'editDesigns')}
        studio={(slot) => (
          <ErrorBoundary fallback={<p className="rounded border border-zinc-200 bg-white p-4 text-sm">The drawing could not be shown; the form below still works.</p>}>
            <Suspense fallback={<div className="flex h-[clamp(520px,calc(100vh-13rem),960px)] items-center justify-center rounded-lg border border-zinc-200 bg-white text-sm text-zinc-500">Loading the studio…</div>}>
              <DesignStudio {...slot} units={units} onUnitsChange={setUnits} />
            </Suspense>
          </ErrorBoundary>
        )}
        conflictDetails={(theirs, mine) => <ConflictChanges theirs={theirs} mine={mine} units={units} />}
        units={units}
        heading={{
          back: (
            <Link to={paths.designs.getHref(workshopId)} className="text-zinc-500 hover:text-zinc-900">
              ← All designs
            </Link>
          ),
          title: <span data-testid="design-title">{data.name}</span>,
          subtitle: ({ outer: o }) =>
            units === 'in'
              ? `${[o.width, o.height, o.depth].map((v) => formatInches(v).replace(/"$/, '')).join(' × ')} in`
              : formatSizeMm(o.width, o.height, o.depth),
        }}
      />
      <Card title="History" className="mt-8 max-w-3xl">
        <HistoryList workshopId={workshopId} subjectType="design" subjectId={designId} />
      </Card>
    </>
  );
}
