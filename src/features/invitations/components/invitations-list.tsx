import type { InvitationDto } from '../../../../shared/schemas/api.schema';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Spinner } from '../../../components/ui/spinner';
import { LoadError } from '../../../components/ui/states';
import { formatDateTime, formatRelativeTime } from '../../../lib/format';
import { ROLE_LABELS } from '../../../lib/roles';
import { useInvitations, useRevokeInvitation } from '../api/invitations';

const STATUS: Record<InvitationDto['status'], { label: string; tone: 'neutral' | 'accent' | 'warning' }> = {
  pending: { label: 'Waiting', tone: 'accent' },
  accepted: { label: 'Accepted', tone: 'neutral' },
  expired: { label: 'Expired', tone: 'warning' },
  revoked: { label: 'Withdrawn', tone: 'neutral' },
};

export function InvitationsList({ workshopId }: { workshopId: number }) {
  const list = useInvitations(workshopId);
  const revoke = useRevokeInvitation(workshopId);
  if (list.isPending) return <Spinner label="Loading invitations…" />;
  if (list.isError) return <LoadError what="the invitations" error={list.error} onRetry={() => list.refetch()} />;
  if (list.data.length === 0) return <p className="text-sm text-zinc-500">No invitations yet. Invite someone above; the invitation shows here until it is used.</p>;
  return (
    <ul className="divide-y divide-zinc-100" data-testid="invitations">
      {list.data.map((inv) => (
        <li key={inv.id} className="flex items-center gap-3 py-2.5 text-sm">
          <span className="min-w-0 flex-1">
            <span className="block font-bold text-zinc-900">{inv.email}</span>
            <span className="block text-[13px] text-zinc-500">
              {ROLE_LABELS[inv.role]} · invited by {inv.invitedBy} <time title={formatDateTime(inv.createdAt)}>{formatRelativeTime(inv.createdAt)}</time>
            </span>
          </span>
          <Badge tone={STATUS[inv.status].tone}>{STATUS[inv.status].label}</Badge>
          {inv.status === 'pending' ? (
            <Button size="sm" variant="ghost" busy={revoke.isPending && revoke.variables === inv.id} onClick={() => revoke.mutate(inv.id)}>
              Withdraw
            </Button>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
