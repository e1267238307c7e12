import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { newPasswordSchema } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { TextField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';

// Typing the new password twice is a client-side courtesy; the server checks the password itself.
const newPasswordFormSchema = z
  .object({ name: z.string().trim().max(120).optional(), password: newPasswordSchema, repeat: z.string() })
  .refine((value) => value.password === value.repeat, { path: ['repeat'], message: 'does not match the password' });
type NewPasswordForm = z.infer<typeof newPasswordFormSchema>;

/** Choosing a password: used when accepting an invitation (with a name) and when resetting. */
export function NewPasswordForm({ askName, defaultName = '', submitLabel, busy, onSubmit }: {
  askName: boolean;
  defaultName?: string;
  submitLabel: string;
  busy: boolean;
  onSubmit: (input: { name?: string; password: string }) => Promise<unknown>;
}) {
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<NewPasswordForm>({
    resolver: zodResolver(newPasswordFormSchema),
    defaultValues: { name: defaultName, password: '', repeat: '' },
  });

  const submit = handleSubmit(async ({ name, password }) => {
    setAlert(null);
    try {
      await onSubmit(askName ? { name: name || undefined, password } : { password });
    } catch (error) {
      setAlert(applyServerError(error, setError, ['name', 'password']));
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormAlert message={alert} />
      {askName && <TextField label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register('name')} />}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <TextField label="Repeat the password" type="password" autoComplete="new-password" error={formState.errors.repeat?.message} {...register('repeat')} />
      <Button type="submit" busy={busy} className="w-full">
        {submitLabel}
      </Button>
    </form>
  );
}
