import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { signupInput, type MeDto, type SignupInput } from '../../../../shared/schemas/api.schema';
import { applyApiError } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, Input } from '../../../components/ui/field';
import { useSignup } from '../api/signup';

export function SignUpForm({ onSignedUp }: { onSignedUp: (me: MeDto) => void }) {
  const signup = useSignup();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignupInput>({
    resolver: zodResolver(signupInput),
    defaultValues: { email: '', password: '', workshopName: '' },
  });

  const onSubmit = handleSubmit((values) =>
    signup.mutateAsync(values).then(onSignedUp, (error: unknown) => applyApiError(error, setError)),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
      <Field label="Workshop name" error={errors.workshopName?.message} hint="You will be its owner and can invite others later.">
        {({ id, invalid, describedBy }) => (
          <Input id={id} autoFocus autoComplete="organization" invalid={invalid} aria-describedby={describedBy} {...register('workshopName')} />
        )}
      </Field>
      <Field label="E-mail" error={errors.email?.message}>
        {({ id, invalid, describedBy }) => (
          <Input id={id} type="email" autoComplete="username" invalid={invalid} aria-describedby={describedBy} {...register('email')} />
        )}
      </Field>
      <Field label="Password" error={errors.password?.message} hint="At least 10 characters.">
        {({ id, invalid, describedBy }) => (
          <Input id={id} type="password" autoComplete="new-password" invalid={invalid} aria-describedby={describedBy} {...register('password')} />
        )}
      </Field>
      <Button type="submit" variant="primary" className="w-full" busy={signup.isPending}>
        Create workshop
      </Button>
    </form>
  );
}
