import { useState } from 'react';
import type { MailMessageDto } from '../../../../shared/schemas/api.schema';
import { Badge } from '../../../components/ui/badge';
import { Spinner } from '../../../components/ui/spinner';
import { EmptyState, LoadError } from '../../../components/ui/states';
import { formatDateTime, formatRelativeTime } from '../../../lib/format';
import { useSentMail } from '../api/get-sent-mail';

const KIND_LABELS: Record<string, string> = { invitation: 'Invitation', 'share-link': 'Cut plan link', 'password-reset': 'Password link' };
const VIA: Record<MailMessageDto['via'], string> = {
  catcher: 'E-mail goes to the local mail catcher started by Boxwright itself (nothing leaves this computer). Set SMTP_URL to send for real.',
  smtp: 'E-mail goes out through the SMTP server in SMTP_URL. Links are not kept here.',
  none: 'E-mail is not set up: messages are recorded here but not delivered.',
};

/** Links in a message, clickable (only our own http(s) links are turned into anchors). */
function MessageText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <pre className="mt-2 rounded-md bg-zinc-50 p-3 text-[13px] leading-relaxed whitespace-pre-wrap text-zinc-800">
      {parts.map((part, i) =>
        /^https?:\/\//.test(part) ? (
          <a key={i} href={part} className="break-all text-accent-700 underline" rel="noreferrer">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}

/** The owner's "Sent mail": what the program sent for this workshop, newest first. */
export function SentMailList({ workshopId }: { workshopId: number }) {
  const mail = useSentMail(workshopId);
  const [open, setOpen] = useState<number | null>(null);
  if (mail.isPending) return <Spinner label="Loading sent mail…" />;
  if (mail.isError) return <LoadError what="the sent mail" error={mail.error} onRetry={() => mail.refetch()} />;
  const { items, via } = mail.data;
  return (
    <>
      <p className="mb-4 text-sm text-zinc-600">{VIA[via]}</p>
      {items.length === 0 ? <EmptyState title="Nothing sent yet">Invitations and cut plan links sent by e-mail appear here.</EmptyState> : null}
      <ul hidden={items.length === 0} className="divide-y divide-zinc-100 rounded-xl border border-zinc-200 bg-white shadow-xs" data-testid="sent-mail">
        {items.map((m) => (
          <li key={m.id} className="px-5 py-3">
            <button type="button" className="flex w-full items-start gap-3 text-left" aria-expanded={open === m.id} onClick={() => setOpen(open === m.id ? null : m.id)}>
              <span className="min-w-0 flex-1">
                <span className="block truncate font-bold text-zinc-900">{m.subject}</span>
                <span className="block text-[13px] text-zinc-500">
                  to {m.to} · <time title={formatDateTime(m.sentAt)}>{formatRelativeTime(m.sentAt)}</time>
                </span>
              </span>
              <Badge>{KIND_LABELS[m.kind] ?? m.kind}</Badge>
              {m.status === 'failed' ? <Badge tone="warning">Not sent</Badge> : m.caughtAt ? <Badge tone="accent">Kept on this computer</Badge> : <Badge>Sent</Badge>}
            </button>
            {open === m.id ? (
              <>
                {m.error ? <p className="mt-2 text-sm text-red-700">{m.error}</p> : null}
                <MessageText text={m.text} />
              </>
            ) : null}
          </li>
        ))}
      </ul>
    </>
  );
}
