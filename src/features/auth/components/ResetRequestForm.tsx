import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { passwordResetRequestSchema } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { TextField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { useRequestPasswordReset } from '../api/queries';

export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<{ email: string }>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });

  if (request.isSuccess) {
    return (
      <p role="status" className="rounded-md bg-tide-50 px-4 py-3 text-sm text-tide-700">
        If an account uses that address, a reset link is on its way. The link works once and expires.
      </p>
    );
  }

  const submit = handleSubmit((input) => {
    setAlert(null);
    request.mutate(input, { onError: (error) => setAlert(applyServerError(error, setError, ['email'])) });
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormAlert message={alert} />
      <TextField label="E-mail" type="email" autoComplete="username" error={formState.errors.email?.message} {...register('email')} />
      <Button type="submit" busy={request.isPending} className="w-full">
        Send a reset link
      </Button>
    </form>
  );
}
