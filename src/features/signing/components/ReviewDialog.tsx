import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { countersignSchema, returnSchema, type CountersignInput, type ReturnInput } from '../../../../shared/schemas/signing';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { TextField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { SignatureRefused, useCountersign, useReturn } from '../api/queries';
import { Dialog } from './Dialog';
import { SignerFields } from './SignerFields';

function CountersignForm({ pageId, addendumId, onDone, onChanged }: { pageId: string; addendumId: string | null; onDone: () => void; onChanged?: () => void }) {
  const countersign = useCountersign(pageId, addendumId, onChanged);
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<CountersignInput>({
    resolver: zodResolver(countersignSchema),
    defaultValues: { email: '', password: '', meaning: 'witnessed' },
  });
  const submit = handleSubmit((input) => {
    setAlert(null);
    countersign.mutate(input, {
      onSuccess: onDone,
      onError: (error) => setAlert(error instanceof SignatureRefused ? error.message : applyServerError(error, setError, ['email', 'password', 'meaning'])),
    });
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Countersign">
      <FormAlert message={alert} />
      <SignerFields role="witness" register={register} errors={formState.errors} />
      <div className="flex justify-end">
        <Button type="submit" busy={countersign.isPending}>
          Countersign
        </Button>
      </div>
    </form>
  );
}

function ReturnForm({ pageId, addendumId, onDone, onChanged }: { pageId: string; addendumId: string | null; onDone: () => void; onChanged?: () => void }) {
  const send = useReturn(pageId, addendumId, onChanged);
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<ReturnInput>({ resolver: zodResolver(returnSchema), defaultValues: { comment: '' } });
  const submit = handleSubmit((input) => {
    setAlert(null);
    send.mutate(input, { onSuccess: onDone, onError: (error) => setAlert(applyServerError(error, setError, ['comment'])) });
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Return with a comment">
      <FormAlert message={alert} />
      <TextField label="Comment for the author" error={formState.errors.comment?.message} {...register('comment')} />
      <div className="flex justify-end">
        <Button type="submit" tone="danger" busy={send.isPending}>
          Return to the author
        </Button>
      </div>
    </form>
  );
}

/** The supervisor's decision on work waiting for them: countersign it, or return it with a comment. */
export function ReviewDialog({ pageId, addendumId, label, onClose, onChanged }: {
  pageId: string;
  addendumId: string | null;
  label: string;
  onClose: () => void;
  onChanged?: () => void;
}) {
  const [mode, setMode] = useState<'countersign' | 'return'>('countersign');
  return (
    <Dialog title={`Review ${label}`} onClose={onClose}>
      <div role="tablist" aria-label="Decision" className="mb-4 flex gap-2">
        {(['countersign', 'return'] as const).map((m) => (
          <button
            key={m}
            role="tab"
            type="button"
            aria-selected={mode === m}
            onClick={() => setMode(m)}
            className={`rounded-md px-3 py-1.5 text-sm font-medium ${mode === m ? 'bg-tide-600 text-paper-card' : 'text-tide-700 hover:bg-tide-50'}`}
          >
            {m === 'countersign' ? 'Countersign' : 'Return with a comment'}
          </button>
        ))}
      </div>
      {mode === 'countersign' ? (
        <CountersignForm pageId={pageId} addendumId={addendumId} onDone={onClose} onChanged={onChanged} />
      ) : (
        <ReturnForm pageId={pageId} addendumId={addendumId} onDone={onClose} onChanged={onChanged} />
      )}
    </Dialog>
  );
}
