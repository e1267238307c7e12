import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { invitationCreateSchema, roles, type InvitationCreateInput } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { SelectField, TextField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { roleLabels } from '../../../lib/roles';
import { useCreateInvitation } from '../api/queries';

const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));

/** Sends a single-use invitation link by e-mail; the person chooses their password from it. */
export function InviteForm() {
  const invite = useCreateInvitation();
  const [alert, setAlert] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<InvitationCreateInput>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { email: '', name: '', role: 'chemist' },
  });

  const submit = handleSubmit((input) => {
    setAlert(null);
    setSentTo(null);
    invite.mutate(input, {
      onSuccess: (invitation) => {
        setSentTo(invitation.email);
        reset();
      },
      onError: (error) => setAlert(applyServerError(error, setError, ['email', 'name', 'role'])),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Invite someone">
      <FormAlert message={alert} />
      {sentTo && (
        <p role="status" className="rounded-md bg-tide-50 px-3 py-2 text-sm text-tide-700">
          Invitation sent to {sentTo}.
        </p>
      )}
      <TextField label="Name" autoComplete="off" error={formState.errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="off" error={formState.errors.email?.message} {...register('email')} />
      <SelectField label="Role" options={roleOptions} error={formState.errors.role?.message} {...register('role')} />
      <Button type="submit" busy={invite.isPending}>
        Send invitation
      </Button>
    </form>
  );
}
