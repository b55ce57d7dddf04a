import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/**
 * Puts a server error next to the field it names, when the form has that field;
 * returns the message to show at the form's top otherwise (or null when placed).
 */
export function placeServerError<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly string[]): string | null {
  if (error instanceof ApiError) {
    const placed = (error.issues ?? []).filter((issue) => fields.includes(issue.path));
    for (const issue of placed) setError(issue.path as Path<T>, { type: 'server', message: issue.message });
    if (placed.length) return null;
    if (error.field && fields.includes(error.field)) {
      setError(error.field as Path<T>, { type: 'server', message: error.message.replace(/^[\w.]+: /, '') });
      return null;
    }
    return error.message;
  }
  return 'Something went wrong. Try again.';
}
