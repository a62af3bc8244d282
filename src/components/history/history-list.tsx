import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditEventDto, ListDto } from '../../../shared/schemas/api.schema';
import { api } from '../../lib/api-client';
import { formatDateTime, formatRelativeTime } from '../../lib/format';
import { LoadError } from '../ui/states';

export const historyKeys = {
  all: ['history'] as const,
  item: (workshopId: number, subjectType: string, subjectId: number) => [...historyKeys.all, workshopId, subjectType, subjectId] as const,
};

export const historyQueryOptions = (workshopId: number, subjectType: string, subjectId: number) =>
  queryOptions({
    queryKey: historyKeys.item(workshopId, subjectType, subjectId),
    queryFn: () => api.get<ListDto<AuditEventDto>>(`/api/workshops/${workshopId}/history/${subjectType}/${subjectId}`).then((r) => r.items),
  });

/** The "History" of one design, plan, build (its cut plans, photos and files) or stock item: who changed what, and when (newest first). */
export function HistoryList({ workshopId, subjectType, subjectId, limit = 8 }: { workshopId: number; subjectType: 'design' | 'plan' | 'stock' | 'build'; subjectId: number; limit?: number }) {
  const history = useQuery(historyQueryOptions(workshopId, subjectType, subjectId));
  if (history.isPending) return <p className="text-sm text-zinc-500">Loading history…</p>;
  if (history.isError) return <LoadError what="the history" error={history.error} onRetry={() => history.refetch()} />;
  const items = history.data.slice(0, limit);
  if (items.length === 0) return <p className="text-sm text-zinc-500">No changes recorded yet.</p>;
  return (
    <ol className="divide-y divide-zinc-100" aria-label="History">
      {items.map((e) => (
        <li key={e.id} className="py-2.5 text-sm leading-snug first:pt-0 last:pb-0">
          <span className="text-zinc-800 [overflow-wrap:anywhere]">{e.summary}</span>
          <span className="mt-0.5 block text-[13px] text-zinc-500">
            {e.actorEmail} · <time dateTime={e.at} title={formatDateTime(e.at)}>{formatRelativeTime(e.at)}</time>
          </span>
        </li>
      ))}
      {history.data.length > limit ? <li className="pt-2.5 text-[13px] text-zinc-500">…and {history.data.length - limit} earlier changes</li> : null}
    </ol>
  );
}
