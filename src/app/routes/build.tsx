import type { QueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/schemas/api.schema';
import { HistoryList } from '../../components/history/history-list';
import { PageHeader } from '../../components/layouts/app-layout';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { ConfirmDialog } from '../../components/ui/dialog';
import { Spinner } from '../../components/ui/spinner';
import { LoadError } from '../../components/ui/states';
import { paths } from '../../config/paths';
import { formatDateTime, formatNumber, formatRelativeTime } from '../../lib/format';
import { notify } from '../../lib/notify';
import { buildQueryOptions, useBuild } from '../../features/builds/api/get-build';
import { useDeleteBuild } from '../../features/builds/api/delete-build';
import { BuildDialog } from '../../features/builds/components/build-dialog';
import { BuildLines } from '../../features/builds/components/build-lines';
import { useCutPlans } from '../../features/cut-plans/api/get-cut-plans';
import { MakeCutPlan } from '../../features/cut-plans/components/make-cut-plan';
import { useDesigns } from '../../features/designs/api/get-designs';
import { workshopQueryOptions, useWorkshopSettings } from '../../features/workshops/api/workshop-settings';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(buildQueryOptions(parseId(params.workshopId), parseId(params.buildId)));
    // Default cut settings and currency for "Make cut plan".
    void queryClient.prefetchQuery(workshopQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function BuildRoute() {
  const { workshopId, membership } = useWorkshop();
  const buildId = parseId(useParams().buildId);
  const build = useBuild(workshopId, buildId);
  const plans = useCutPlans(workshopId, buildId);
  const canEdit = can(membership.role, 'editDesigns');
  const canRun = can(membership.role, 'runCutPlans');
  const designs = useDesigns(workshopId);
  const settings = useWorkshopSettings(workshopId);
  const remove = useDeleteBuild(workshopId);
  const navigate = useNavigate();
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const openPlan = useCallback((planId: number) => navigate(paths.cutPlan.getHref(workshopId, planId)), [navigate, workshopId]);

  if (build.isPending)
    return (
      <>
        <title>{workshopTitle('Build', membership.workshopName)}</title>
        <Spinner label="Loading the build…" />
      </>
    );
  if (build.isError)
    return (
      <>
        <title>{workshopTitle('Build', membership.workshopName)}</title>
        <LoadError what="the build" error={build.error} onRetry={() => build.refetch()} />
      </>
    );
  const b = build.data;

  return (
    <>
      <title>{workshopTitle(b.name, membership.workshopName)}</title>
      <PageHeader
        back={<Link to={paths.builds.getHref(workshopId)} className="text-accent-700 hover:underline">← Builds</Link>}
        title={b.name}
        description={`${b.cabinetCount} cabinet${b.cabinetCount === 1 ? '' : 's'}${b.notes ? ` · ${b.notes}` : ''}`}
        actions={
          canEdit ? (
            <>
              <Button onClick={() => setEditing(true)} disabled={!designs.data}>
                Edit
              </Button>
              <Button variant="ghostDanger" onClick={() => setDeleting(true)}>
                Delete
              </Button>
            </>
          ) : null
        }
      />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6">
          {canRun && settings.isPending ? (
            <Spinner label="Loading the cut settings…" />
          ) : canRun ? (
            // The form starts from the workshop's defaults; if they cannot be read, from the usual ones.
            <MakeCutPlan
              workshopId={workshopId}
              buildId={buildId}
              canReadStock={can(membership.role, 'readStock')}
              onDone={openPlan}
              defaults={settings.data?.cutDefaults}
              currency={settings.data?.currency}
            />
          ) : (
            <Alert>Your role can read this build and its cut plans; makers, designers and owners make new cut plans.</Alert>
          )}
        </div>
        <div className="space-y-6">
          <Card title="Cabinets">
            <div className="text-sm text-zinc-800">
              <BuildLines items={b.items} designHref={(id) => paths.design.getHref(workshopId, id)} />
            </div>
            <p className="mt-3 text-xs text-zinc-500">A mirrored pair builds half of the cabinets as the mirror image: openings on the left side move to the right side and the other way round.</p>
          </Card>
          <Card title="Cut plans">
            {plans.isPending ? <Spinner label="Loading…" /> : null}
            {plans.data?.length === 0 ? <p className="text-sm text-zinc-500">None yet.</p> : null}
            <ul className="divide-y divide-zinc-100 text-sm" data-testid="build-cut-plans">
              {plans.data?.map((p) => (
                <li key={p.id} className="py-2">
                  <Link to={paths.cutPlan.getHref(workshopId, p.id)} className="font-bold text-zinc-900 hover:text-accent-700 hover:underline">
                    Cut plan {p.id}
                  </Link>
                  <span className="text-zinc-500" title={formatDateTime(p.createdAt)}>
                    {' '}
                    · {formatRelativeTime(p.createdAt)}
                  </span>
                  <p className="text-xs text-zinc-500 tabular-nums">
                    {p.totals.sheetsUsed} sheets · {formatNumber(p.totals.rollLengthMm / 1000, 2)} m lining · {p.mode}
                    {p.warningCount ? ` · ${p.warningCount} warning${p.warningCount === 1 ? '' : 's'}` : ''}
                  </p>
                </li>
              ))}
            </ul>
          </Card>
          <Card title="History">
            <HistoryList workshopId={workshopId} subjectType="build" subjectId={buildId} />
          </Card>
        </div>
      </div>
      {canEdit && designs.data ? (
        <BuildDialog
          workshopId={workshopId}
          designs={designs.data.map((d) => ({ id: d.id, name: d.name }))}
          existing={b}
          open={editing}
          onClose={() => setEditing(false)}
          onSaved={() => setEditing(false)}
        />
      ) : null}
      <ConfirmDialog
        open={deleting}
        title={`Delete "${b.name}"?`}
        confirmLabel="Delete build"
        tone="danger"
        busy={remove.isPending}
        error={remove.error?.message ?? null}
        onCancel={() => setDeleting(false)}
        onConfirm={() =>
          remove.mutate(buildId, {
            onSuccess: () => {
              notify(`Deleted "${b.name}" and its cut plans.`, 'success');
              navigate(paths.builds.getHref(workshopId));
            },
          })
        }
      >
        Its cut plans are deleted with it. The designs stay.
      </ConfirmDialog>
    </>
  );
}
