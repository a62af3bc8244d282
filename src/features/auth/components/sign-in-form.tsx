import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { loginInput, type LoginInput } from '../../../../shared/schemas/api.schema';
import { isApiError } from '../../../lib/api-client';
import { applyApiError } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, Input } from '../../../components/ui/field';
import { useLogin } from '../api/login';
import type { MeDto } from '../../../../shared/schemas/api.schema';

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeDto) => void }) {
  const login = useLogin();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<LoginInput>({ resolver: zodResolver(loginInput), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit((values) =>
    login.mutateAsync(values).then(onSignedIn, (error: unknown) => {
      if (isApiError(error) && error.isUnauthorized) {
        setError('root.server', { type: 'server', message: 'That e-mail and password do not match an account.' });
      } else applyApiError(error, setError);
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {errors.root?.server ? <Alert tone="error">{errors.root.server.message}</Alert> : null}
      <Field label="E-mail" error={errors.email?.message}>
        {({ id, invalid, describedBy }) => (
          <Input id={id} type="email" autoComplete="username" autoFocus invalid={invalid} aria-describedby={describedBy} {...register('email')} />
        )}
      </Field>
      <Field label="Password" error={errors.password?.message}>
        {({ id, invalid, describedBy }) => (
          <Input
            id={id}
            type="password"
            autoComplete="current-password"
            invalid={invalid}
            aria-describedby={describedBy}
            {...register('password')}
          />
        )}
      </Field>
      <Button type="submit" variant="primary" className="w-full" busy={login.isPending}>
        Sign in
      </Button>
    </form>
  );
}
