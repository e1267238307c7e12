import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

/** Our schemas phrase field messages as "is required" / "must be …"; read them after the label. */
export function fieldMessage(label: string, message: string | undefined): string | undefined {
  if (!message) return undefined;
  return /^(is|must|should|has|cannot|can't)\b/.test(message) ? `${label} ${message}` : message;
}

const control =
  'block w-full rounded-md border bg-paper-card px-3 py-2 text-sm text-ink placeholder:text-ink-faint focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200 disabled:bg-paper-deep';

function FieldShell({ id, label, hint, error, children }: { id: string; label: string; hint?: ReactNode; error?: string; children: ReactNode }) {
  const shown = fieldMessage(label, error);
  return (
    <div className="space-y-1.5">
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      {children}
      {shown ? (
        <p id={`${id}-error`} role="alert" className="text-sm text-ember-700">
          {shown}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: ReactNode;
}

export const TextField = forwardRef<HTMLInputElement, TextFieldProps>(function TextField({ label, error, hint, className = '', ...rest }, ref) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <input
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className={`${control} ${error ? 'border-ember-500' : 'border-fold-strong'} ${className}`}
        {...rest}
      />
    </FieldShell>
  );
});

interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  error?: string;
  hint?: ReactNode;
  options: readonly { value: string; label: string }[];
}

export const SelectField = forwardRef<HTMLSelectElement, SelectFieldProps>(function SelectField(
  { label, error, hint, options, className = '', ...rest },
  ref,
) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error}>
      <select
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        className={`${control} ${error ? 'border-ember-500' : 'border-fold-strong'} ${className}`}
        {...rest}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
});
