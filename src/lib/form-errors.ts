import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';

/**
 * Put the server's field errors beside the fields they belong to. Returns the message to show
 * above the form for whatever could not be placed on a field (or null when everything was).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  const unplaced: string[] = [];
  let placed = 0;
  let first = true;
  for (const [field, message] of Object.entries(error.fields)) {
    if ((fieldNames as readonly string[]).includes(field)) {
      setError(field as Path<T>, { type: 'server', message }, { shouldFocus: first });
      first = false;
      placed += 1;
    } else {
      unplaced.push(message);
    }
  }
  if (unplaced.length > 0) return unplaced.join(' ');
  return placed > 0 ? null : error.message;
}
