import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { membershipRoles, membershipUpsertSchema, type DirectoryPerson, type MembershipRole } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { SelectField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { membershipLabels, roleLabels } from '../../../lib/roles';
import { useSetNotebookMember } from '../api/queries';

/** Adds someone from the group directory to a notebook. `candidates` are people not yet in it. */
export function AddMemberForm({ notebookId, candidates }: { notebookId: string; candidates: DirectoryPerson[] }) {
  const add = useSetNotebookMember(notebookId);
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, setValue, reset, watch, formState } = useForm<{ userId: string; role: MembershipRole }>({
    resolver: zodResolver(membershipUpsertSchema),
    defaultValues: { userId: '', role: 'editor' },
  });
  const chosen = candidates.find((user) => user.id === watch('userId'));
  const chosenIsViewer = chosen?.role === 'viewer';
  useEffect(() => {
    if (chosenIsViewer) setValue('role', 'reader');
  }, [chosenIsViewer, setValue]);
  // Org viewers are read-only everywhere, so only "reader" is offered for them.
  const roleOptions = membershipRoles
    .filter((role) => !chosenIsViewer || role === 'reader')
    .map((role) => ({ value: role, label: membershipLabels[role] }));

  if (candidates.length === 0) return <p className="text-sm text-ink-soft">Everyone in the group is already a member.</p>;

  const submit = handleSubmit((input) => {
    setAlert(null);
    add.mutate(input, {
      onSuccess: () => reset({ userId: '', role: 'editor' }),
      // The server's own refusal (e.g. `viewer_read_only` when the directory was out of date) is shown as it comes.
      onError: (error) => setAlert(applyServerError(error, setError, ['userId', 'role'])),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Add a member">
      <FormAlert message={alert} />
      <SelectField
        label="Person"
        error={formState.errors.userId ? 'Choose a person' : undefined}
        options={[{ value: '', label: 'Choose…' }, ...candidates.map((user) => ({ value: user.id, label: `${user.name} (${roleLabels[user.role]})` }))]}
        {...register('userId')}
      />
      <SelectField
        label="Part in this notebook"
        options={roleOptions}
        hint={chosenIsViewer ? 'People with the viewer role can only be readers.' : undefined}
        error={formState.errors.role?.message}
        {...register('role')}
      />
      <Button type="submit" busy={add.isPending}>
        Add to notebook
      </Button>
    </form>
  );
}
