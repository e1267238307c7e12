import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { signInSchema, type Me, type SignInInput } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { TextField } from '../../../components/FormField';
import { isApiError } from '../../../lib/api';
import { applyServerError } from '../../../lib/forms';
import { useSignIn } from '../api/queries';

export function SignInForm({ onSignedIn }: { onSignedIn: (me: Me) => void }) {
  const signIn = useSignIn();
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const submit = handleSubmit((input) => {
    setAlert(null);
    signIn.mutate(input, {
      onSuccess: onSignedIn,
      onError: (error) =>
        setAlert(
          isApiError(error, 401)
            ? 'That e-mail and password do not match an account.'
            : applyServerError(error, setError, ['email', 'password']),
        ),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Sign in">
      <FormAlert message={alert} />
      <TextField label="E-mail" type="email" autoComplete="username" error={formState.errors.email?.message} {...register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" busy={signIn.isPending} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
