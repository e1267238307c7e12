import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { notebookCreateSchema, type NotebookCreateInput, type NotebookSummary } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { TextField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { useCreateNotebook } from '../api/queries';

export function NotebookCreateForm({ onCreated, onCancel }: { onCreated: (notebook: NotebookSummary) => void; onCancel: () => void }) {
  const create = useCreateNotebook();
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<NotebookCreateInput>({
    resolver: zodResolver(notebookCreateSchema),
    defaultValues: { title: '', description: '' },
  });

  const submit = handleSubmit((input) => {
    setAlert(null);
    create.mutate(input, { onSuccess: onCreated, onError: (error) => setAlert(applyServerError(error, setError, ['title', 'description'])) });
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="New notebook">
      <FormAlert message={alert} />
      <TextField label="Title" placeholder="e.g. Esterification screen, spring" autoFocus error={formState.errors.title?.message} {...register('title')} />
      <TextField label="Description" hint="Optional: what the notebook is for." error={formState.errors.description?.message} {...register('description')} />
      <div className="flex gap-2">
        <Button type="submit" busy={create.isPending}>
          Create notebook
        </Button>
        <Button tone="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
