import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { pageCreateSchema, type PageCreateInput, type PageDetail } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { TextField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { useCreatePage } from '../api/queries';

/** Starts the next page of a notebook; the server gives it the next number. */
export function PageCreateForm({ notebookId, onCreated }: { notebookId: string; onCreated: (page: PageDetail) => void }) {
  const create = useCreatePage(notebookId);
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<PageCreateInput>({
    resolver: zodResolver(pageCreateSchema),
    defaultValues: { title: '' },
  });

  const submit = handleSubmit((input) => {
    setAlert(null);
    create.mutate(input, { onSuccess: onCreated, onError: (error) => setAlert(applyServerError(error, setError, ['title'])) });
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="New page">
      <FormAlert message={alert} />
      <div className="flex flex-wrap items-start gap-3">
        <div className="min-w-64 flex-1">
          <TextField label="Title of the new page" placeholder="e.g. Ethyl butanoate via Fischer esterification" error={formState.errors.title?.message} {...register('title')} />
        </div>
        <Button type="submit" busy={create.isPending} className="mt-7">
          Start page
        </Button>
      </div>
    </form>
  );
}
