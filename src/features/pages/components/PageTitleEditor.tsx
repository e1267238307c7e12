import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { pageUpdateSchema, type PageDetail } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { fieldMessage } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { useRenamePage } from '../api/queries';

/** The page title: editable in place when the caller may edit and the page is not locked. */
export function PageTitleEditor({ page }: { page: PageDetail }) {
  const rename = useRenamePage(page.id);
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<{ title: string }>({
    resolver: zodResolver(pageUpdateSchema),
    values: { title: page.title },
  });
  const editable = page.access.canEdit && !page.locked;

  if (!editable) {
    return <h1 className="text-2xl font-semibold tracking-tight text-ink">{page.title}</h1>;
  }

  const submit = handleSubmit((input) => {
    setAlert(null);
    rename.mutate(input, {
      onSuccess: (saved) => reset({ title: saved.title }),
      onError: (error) => setAlert(applyServerError(error, setError, ['title'])),
    });
  });
  const error = fieldMessage('Title', formState.errors.title?.message);

  return (
    <form onSubmit={submit} noValidate className="space-y-2" aria-label="Page title">
      <FormAlert message={alert} />
      <div className="flex items-center gap-2">
        <label htmlFor="page-title" className="sr-only">
          Title
        </label>
        <input
          id="page-title"
          aria-invalid={error ? true : undefined}
          className="min-w-0 flex-1 rounded-md border border-transparent bg-transparent px-2 py-1 -ml-2 text-2xl font-semibold tracking-tight text-ink hover:border-fold focus:border-tide-400 focus:bg-paper-card focus:outline-none focus:ring-2 focus:ring-tide-100"
          {...register('title')}
        />
        {formState.isDirty && (
          <>
            <Button type="submit" busy={rename.isPending}>
              Save title
            </Button>
            <Button tone="quiet" onClick={() => reset({ title: page.title })}>
              Undo
            </Button>
          </>
        )}
      </div>
      {error && (
        <p role="alert" className="text-sm text-ember-700">
          {error}
        </p>
      )}
    </form>
  );
}
