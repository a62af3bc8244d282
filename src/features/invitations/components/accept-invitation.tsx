import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { MeDto } from '../../../../shared/schemas/api.schema';
import { passwordSchema } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button, ButtonLink } from '../../../components/ui/button';
import { Field, Input } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/roles';
import { invitationPreviewQueryOptions, useAcceptInvitation } from '../api/invitations';

/**
 * The invitation link's page: a new person chooses a password; someone with an account signs in as the
 * invited e-mail and accepts. Either way they join the workshop with the invited role.
 */
export function AcceptInvitation({ token, me, signInHref, onJoined }: { token: string; me: MeDto | null; signInHref: string; onJoined: (workshopId: number) => void }) {
  const preview = useQuery(invitationPreviewQueryOptions(token));
  const accept = useAcceptInvitation(token);
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [localError, setLocalError] = useState<string | null>(null);

  if (preview.isPending) return <p className="text-sm text-zinc-500">Checking the invitation…</p>;
  if (preview.isError) {
    return (
      <Alert
        tone="error"
        title="This invitation cannot be used"
        actions={preview.error.status === 0 ? <Button onClick={() => preview.refetch()}>Try again</Button> : undefined}
      >
        {isApiError(preview.error) ? preview.error.message : 'Please try again.'}{' '}
        {preview.error.status === 0 ? '' : "An invitation works once, for 7 days: ask the workshop's owner to send a new one."}
      </Alert>
    );
  }
  const inv = preview.data;
  const serverError = accept.error ? (isApiError(accept.error) ? (accept.error.fields.password ?? accept.error.message) : 'Please try again.') : null;
  const wrongAccount = me && me.user.email !== inv.email;

  return (
    <div className="space-y-4">
      <p className="text-sm text-zinc-700">
        You are invited to <strong>{inv.workshopName}</strong> as <strong>{ROLE_LABELS[inv.role]}</strong> ({ROLE_DESCRIPTIONS[inv.role].toLowerCase()}).
        The invitation is for <strong>{inv.email}</strong>.
      </p>
      {serverError || localError ? <Alert tone="error">{localError ?? serverError}</Alert> : null}
      {inv.accountExists ? (
        me && !wrongAccount ? (
          <Button variant="primary" className="w-full" busy={accept.isPending} onClick={() => accept.mutate(undefined, { onSuccess: (r) => onJoined(r.workshopId) })}>
            Join {inv.workshopName}
          </Button>
        ) : (
          <>
            <p className="text-sm text-zinc-600">
              {wrongAccount ? `You are signed in as ${me.user.email}. ` : ''}Sign in as {inv.email} to accept; you come back here afterwards.
            </p>
            <ButtonLink to={signInHref} variant="primary" className="w-full">
              Sign in as {inv.email}
            </ButtonLink>
          </>
        )
      ) : wrongAccount ? (
        <p className="text-sm text-zinc-600">You are signed in as {me.user.email}. Sign out first to make the account for {inv.email}.</p>
      ) : (
        <form
          className="space-y-4"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            const checked = passwordSchema.safeParse(password);
            if (!checked.success) return setLocalError(checked.error.issues[0]?.message ?? 'Choose a longer password.');
            if (password !== repeat) return setLocalError('The two passwords are not the same.');
            setLocalError(null);
            accept.mutate(password, { onSuccess: (r) => onJoined(r.workshopId) });
          }}
        >
          <Field label="Choose a password" hint="At least 10 characters">
            {(p) => <Input id={p.id} type="password" autoComplete="new-password" value={password} onChange={(e) => setPassword(e.target.value)} aria-describedby={p.describedBy} />}
          </Field>
          <Field label="Repeat the password">
            {(p) => <Input id={p.id} type="password" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} />}
          </Field>
          <Button type="submit" variant="primary" className="w-full" busy={accept.isPending}>
            Make my account and join
          </Button>
        </form>
      )}
    </div>
  );
}
