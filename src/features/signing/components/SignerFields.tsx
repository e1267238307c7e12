import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { meaningsFor, type SignatureRole } from '../../../../shared/schemas/signing';
import { SelectField, TextField } from '../../../components/FormField';

interface SignerValues {
  email: string;
  password: string;
  meaning: string;
}

/**
 * The two signature components and the meaning (21 CFR 11.200(a)(1) and 11.50(a)(3)): asked for
 * at every signing, so a signature is always a deliberate act by the signed-in person.
 */
export function SignerFields<T extends SignerValues>({ role, register, errors }: {
  role: SignatureRole;
  register: UseFormRegister<T>;
  errors: FieldErrors<SignerValues>;
}) {
  const reg = register as unknown as UseFormRegister<SignerValues>;
  return (
    <>
      <SelectField
        label="Meaning of your signature"
        options={meaningsFor(role).map((m) => ({ value: m.code, label: m.label }))}
        error={errors.meaning?.message}
        {...reg('meaning')}
      />
      <TextField label="Your e-mail" type="email" autoComplete="username" hint="The address you sign in with" error={errors.email?.message} {...reg('email')} />
      <TextField label="Your password" type="password" autoComplete="current-password" error={errors.password?.message} {...reg('password')} />
    </>
  );
}
