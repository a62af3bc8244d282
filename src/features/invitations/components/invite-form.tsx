import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { invitationInput, ROLES, type InvitationInput } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, Input, Select } from '../../../components/ui/field';
import { applyApiError } from '../../../lib/form-errors';
import { notify } from '../../../lib/notify';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '../../../lib/roles';
import { useInvite } from '../api/invitations';

/** The owner invites someone by e-mail with a role; the e-mail carries a link that works once, for 7 days. */
export function InviteForm({ workshopId }: { workshopId: number }) {
  const invite = useInvite(workshopId);
  const { register, handleSubmit, setError, reset, watch, formState } = useForm<InvitationInput>({
    resolver: zodResolver(invitationInput),
    defaultValues: { email: '', role: 'maker' },
  });
  const errors = formState.errors;
  const role = watch('role');
  const submit = handleSubmit((values) =>
    invite.mutate(values, {
      onSuccess: (r) => {
        notify(r.mailSent ? `Invitation sent to ${r.email}.` : `Invitation saved, but the e-mail to ${r.email} could not be sent (see Sent mail).`, r.mailSent ? 'success' : 'error');
        reset({ email: '', role: values.role });
      },
      onError: (error) => applyApiError(error, setError),
    }),
  );
  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-start gap-3">
      <Field label="E-mail" error={errors.email?.message} className="w-72">
        {(p) => <Input id={p.id} type="email" invalid={p.invalid} aria-describedby={p.describedBy} {...register('email')} />}
      </Field>
      <Field label="Role" error={errors.role?.message} hint={role ? ROLE_DESCRIPTIONS[role] : undefined} className="w-80">
        {(p) => (
          <Select id={p.id} invalid={p.invalid} aria-describedby={p.describedBy} {...register('role')}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <div>
        {/* An empty label line of the fields' height, so the button lines up with the inputs. */}
        <span aria-hidden="true" className="mb-1 block text-[13px]">
          &nbsp;
        </span>
        <Button type="submit" variant="primary" busy={invite.isPending}>
          Send invitation
        </Button>
      </div>
      {errors.root?.server ? (
        <Alert tone="error" className="w-full">
          {errors.root.server.message}
        </Alert>
      ) : null}
    </form>
  );
}
