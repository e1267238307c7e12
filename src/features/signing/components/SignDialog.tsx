import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { signPageSchema, type SignPageInput } from '../../../../shared/schemas/signing';
import { Button } from '../../../components/Button';
import { FormAlert } from '../../../components/FormAlert';
import { SelectField } from '../../../components/FormField';
import { applyServerError } from '../../../lib/forms';
import { SignatureRefused, useCountersigners, useSignPage } from '../api/queries';
import { Dialog } from './Dialog';
import { SignerFields } from './SignerFields';

/** The author signs the page: it locks for everyone and goes to the chosen supervisor. */
export function SignDialog({ pageId, onClose, onChanged }: { pageId: string; onClose: () => void; onChanged?: () => void }) {
  const supervisors = useCountersigners(pageId);
  const sign = useSignPage(pageId, onChanged);
  const [alert, setAlert] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignPageInput>({
    resolver: zodResolver(signPageSchema),
    defaultValues: { email: '', password: '', meaning: 'performed', supervisorId: '' },
  });
  const submit = handleSubmit((input) => {
    setAlert(null);
    sign.mutate(input, {
      onSuccess: onClose,
      onError: (error) =>
        setAlert(error instanceof SignatureRefused ? error.message : applyServerError(error, setError, ['email', 'password', 'meaning', 'supervisorId'])),
    });
  });
  const options = [{ value: '', label: 'Choose a supervisor…' }, ...(supervisors.data ?? []).map((s) => ({ value: s.id, label: s.name }))];

  return (
    <Dialog title="Sign this page" onClose={onClose}>
      <form onSubmit={submit} noValidate className="space-y-4" aria-label="Sign this page">
        <p className="text-sm text-ink-soft">
          Signing locks the page for everyone. Later changes can only be added below it as dated addenda.
        </p>
        <FormAlert message={alert} />
        <SignerFields role="author" register={register} errors={formState.errors} />
        <SelectField
          label="Supervisor to countersign"
          options={options}
          error={formState.errors.supervisorId ? 'Choose a supervisor' : undefined}
          hint={supervisors.data?.length === 0 ? 'No supervisor is a member of this notebook yet; ask the notebook owner to add one.' : undefined}
          {...register('supervisorId')}
        />
        <div className="flex justify-end gap-2">
          <Button tone="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" busy={sign.isPending}>
            Sign and lock
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
