import { useState } from 'react';
import type { ShareLinkDto } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Field, Input, Select } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime, formatRelativeTime } from '../../../lib/format';
import { useCreateShareLink, useRevokeShareLink, useShareLinks } from '../api/share-links';

const STATUS: Record<ShareLinkDto['status'], { label: string; tone: 'accent' | 'neutral' | 'warning' }> = {
  active: { label: 'Works', tone: 'accent' },
  expired: { label: 'Expired', tone: 'warning' },
  revoked: { label: 'Withdrawn', tone: 'neutral' },
};

/** Make a read-only link to this cut plan, optionally e-mail it, and withdraw links. */
export function SharePanel({ workshopId, planId }: { workshopId: number; planId: number }) {
  const links = useShareLinks(workshopId, planId);
  const create = useCreateShareLink(workshopId, planId);
  const revoke = useRevokeShareLink(workshopId, planId);
  const [days, setDays] = useState(14);
  const [email, setEmail] = useState('');
  const [message, setMessage] = useState('');
  const fields = isApiError(create.error) ? create.error.fields : {};

  return (
    <div className="space-y-5">
      <form
        noValidate
        className="grid gap-3 sm:grid-cols-2"
        onSubmit={(e) => {
          e.preventDefault();
          create.mutate({ days, ...(email.trim() ? { email: email.trim() } : {}), ...(message.trim() ? { message: message.trim() } : {}) });
        }}
      >
        <Field label="Works for" error={fields.days}>
          {(p) => (
            <Select id={p.id} value={days} onChange={(e) => setDays(Number(e.target.value))}>
              {[1, 7, 14, 30, 90].map((d) => (
                <option key={d} value={d}>
                  {d} day{d === 1 ? '' : 's'}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Send it to (optional)" error={fields.email} hint="Someone outside the workshop: they need no account">
          {(p) => <Input id={p.id} type="email" invalid={p.invalid} aria-describedby={p.describedBy} value={email} onChange={(e) => setEmail(e.target.value)} />}
        </Field>
        <Field label="Note in the e-mail (optional)" className="sm:col-span-2" error={fields.message}>
          {(p) => <Input id={p.id} value={message} onChange={(e) => setMessage(e.target.value)} />}
        </Field>
        <div className="sm:col-span-2">
          <Button type="submit" variant="primary" busy={create.isPending}>
            {email.trim() ? 'Send this cut plan' : 'Make a link'}
          </Button>
        </div>
      </form>
      {create.isError && !Object.keys(fields).length ? <Alert tone="error">{create.error.message}</Alert> : null}
      {create.data?.url ? (
        <Alert tone="success" title={create.data.sentTo ? (create.data.mailSent ? `Sent to ${create.data.sentTo}` : `The link is made, but the e-mail to ${create.data.sentTo} failed`) : 'Link made'}>
          <p>Anyone with this link can see this cut plan and download its files until {formatDateTime(create.data.expiresAt)}. It is shown only now:</p>
          <p className="mt-2 flex items-center gap-2">
            <input readOnly value={create.data.url} className="min-w-0 flex-1 rounded border border-accent-200 bg-white px-2 py-1 text-xs" aria-label="Share link" onFocus={(e) => e.target.select()} />
            <Button size="sm" onClick={() => void navigator.clipboard?.writeText(create.data.url ?? '')}>
              Copy
            </Button>
          </p>
        </Alert>
      ) : null}
      <div>
        <h3 className="mb-2 text-[13px] font-bold text-zinc-700">Links to this plan</h3>
        {links.data?.length === 0 ? <p className="text-sm text-zinc-500">None yet.</p> : null}
        <ul className="divide-y divide-zinc-100">
          {links.data?.map((l) => (
            <li key={l.id} className="flex items-center gap-3 py-2 text-sm">
              <span className="min-w-0 flex-1">
                <span className="block text-zinc-800">
                  {l.sentTo ? `Sent to ${l.sentTo}` : 'Link'} · until {formatDateTime(l.expiresAt)}
                </span>
                <span className="block text-[13px] text-zinc-500">
                  by {l.createdBy} · {l.openCount ? `opened ${l.openCount}×, last ${formatRelativeTime(l.lastOpenedAt ?? l.createdAt)}` : 'not opened yet'}
                </span>
              </span>
              <Badge tone={STATUS[l.status].tone}>{STATUS[l.status].label}</Badge>
              {l.status === 'active' ? (
                <Button size="sm" variant="ghost" busy={revoke.isPending && revoke.variables === l.id} onClick={() => revoke.mutate(l.id)}>
                  Withdraw
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}
