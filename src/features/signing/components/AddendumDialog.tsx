import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { addendumSchema, type AddendumInput } from '../../../../shared/schemas/signing';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { SelectField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { SignatureRefused, useAddAddendum, useCountersigners } from '../api/queries';
import { Dialog } from './Dialog';
import { SignerFields } from './SignerFields';

/** A dated note below the signed original, signed like the page; a countersignature is optional. */
export function AddendumDialog({ pageId, onClose, onChanged }: { pageId: string; onClose: () => void; onChanged?: () => void }) {
  const supervisors = useCountersigners(pageId);
  const add = useAddAddendum(pageId, onChanged);
  const [alert, setAlert] = useState<string | null>(null);
  const textId = useId();
  const { register, handleSubmit, setError, formState } = useForm<AddendumInput>({
    resolver: zodResolver(addendumSchema),
    defaultValues: { email: '', password: '', meaning: 'performed', text: '', supervisorId: undefined },
  });
  const submit = handleSubmit((input) => {
    setAlert(null);
    add.mutate(input, {
      onSuccess: onClose,
      onError: (error) =>
        setAlert(error instanceof SignatureRefused ? error.message : applyServerError(error, setError, ['email', 'password', 'meaning', 'text', 'supervisorId'])),
    });
  });
  const options = [{ value: '', label: 'No countersignature' }, ...(supervisors.data ?? []).map((s) => ({ value: s.id, label: s.name }))];
  return (
    <Dialog title="Add a signed addendum" onClose={onClose}>
      <form onSubmit={submit} noValidate className="space-y-4" aria-label="Add a signed addendum">
        <p className="text-sm text-ink-soft">The original page stays as it was signed; the addendum is dated and shown below it.</p>
        <FormAlert message={alert} />
        <div className="space-y-1.5">
          <label htmlFor={textId} className="block text-sm font-medium">
            Addendum
          </label>
          <textarea
            id={textId}
            rows={5}
            className="block w-full rounded-md border border-fold-strong bg-paper-card px-3 py-2 text-sm focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200"
            aria-invalid={formState.errors.text ? true : undefined}
            {...register('text')}
          />
          {formState.errors.text && <p className="text-sm text-ember-700">Addendum {formState.errors.text.message}</p>}
        </div>
        <SignerFields role="author" register={register} errors={formState.errors} />
        <SelectField label="Supervisor to countersign (optional)" options={options} {...register('supervisorId', { setValueAs: (v: string) => v || undefined })} />
        <div className="flex justify-end gap-2">
          <Button tone="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={add.isPending}>
            Sign addendum
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
