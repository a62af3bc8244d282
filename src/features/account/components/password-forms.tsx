import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { passwordResetInput, passwordResetRequestInput } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, Input } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { applyApiError } from '../../../lib/form-errors';
import { passwordLinkQueryOptions, useRequestPasswordLink, useResetPassword } from '../api/password-reset';

/** Ask for a password link. The answer is the same whether or not the e-mail has an account. */
export function ForgotPasswordForm() {
  const ask = useRequestPasswordLink();
  const { register, handleSubmit, setError, formState } = useForm<{ email: string }>({ resolver: zodResolver(passwordResetRequestInput), defaultValues: { email: '' } });
  if (ask.isSuccess) return <Alert tone="success">{ask.data.message}</Alert>;
  return (
    <form noValidate className="space-y-4" onSubmit={handleSubmit((v) => ask.mutate(v.email, { onError: (e) => applyApiError(e, setError) }))}>
      {formState.errors.root?.server ? <Alert tone="error">{formState.errors.root.server.message}</Alert> : null}
      <Field label="E-mail of your account" error={formState.errors.email?.message}>
        {(p) => <Input id={p.id} type="email" autoComplete="username" autoFocus invalid={p.invalid} aria-describedby={p.describedBy} {...register('email')} />}
      </Field>
      <Button type="submit" variant="primary" className="w-full" busy={ask.isPending}>
        Send me a link
      </Button>
    </form>
  );
}

/** The e-mailed link's page: choose a new password (the link works once, for one hour). */
export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const link = useQuery(passwordLinkQueryOptions(token));
  const reset = useResetPassword(token);
  const { register, handleSubmit, setError, formState } = useForm<{ password: string }>({ resolver: zodResolver(passwordResetInput), defaultValues: { password: '' } });
  if (link.isPending) return <p className="text-sm text-zinc-500">Checking the link…</p>;
  if (link.isError)
    return (
      <Alert tone="error" title="This link cannot be used" actions={link.error.status === 0 ? <Button onClick={() => link.refetch()}>Try again</Button> : undefined}>
        {isApiError(link.error) ? link.error.message : 'Please try again.'} {link.error.status === 0 ? '' : 'A link works once, for one hour: ask for a new one below.'}
      </Alert>
    );
  return (
    <form noValidate className="space-y-4" onSubmit={handleSubmit((v) => reset.mutate(v.password, { onSuccess: onDone, onError: (e) => applyApiError(e, setError) }))}>
      <p className="text-sm text-zinc-600">New password for {link.data.email}.</p>
      {formState.errors.root?.server ? <Alert tone="error">{formState.errors.root.server.message}</Alert> : null}
      <Field label="New password" hint="At least 10 characters" error={formState.errors.password?.message}>
        {(p) => <Input id={p.id} type="password" autoComplete="new-password" autoFocus invalid={p.invalid} aria-describedby={p.describedBy} {...register('password')} />}
      </Field>
      <Button type="submit" variant="primary" className="w-full" busy={reset.isPending}>
        Save the new password
      </Button>
    </form>
  );
}
