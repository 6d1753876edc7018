import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/lib/api-client';

/** Puts the server's field issues beside the fields; returns the message for the form as a whole. */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>): string {
  if (err instanceof ApiError) {
    for (const i of err.issues) if (i.path) setError(i.path as Path<T>, { message: i.message });
    return err.message;
  }
  return 'Something went wrong; please try again.';
}
