import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api';

/**
 * Puts the server's per-field messages (400 `fields`) on the matching form fields and returns
 * the message to show above the form, if any is left over.
 */
export function applyServerError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  knownFields: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  let placed = 0;
  for (const [field, message] of Object.entries(error.fields)) {
    const known = knownFields.find((name) => name === field);
    if (known) {
      setError(known, { type: 'server', message });
      placed += 1;
    }
  }
  return placed > 0 && placed === Object.keys(error.fields).length ? null : error.message;
}
