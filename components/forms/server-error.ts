import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { ErrorBody } from '@/lib/errors';

// Shows a server refusal under the field it names when the form has that field, else above the form.
export function showServerError<T extends FieldValues>(
  error: ErrorBody['error'], fields: readonly Path<T>[], setError: UseFormSetError<T>, showAboveForm: (error: ErrorBody['error']) => void,
): void {
  const field = fields.find((name) => name === error.field);
  if (field) setError(field, { message: error.message });
  else showAboveForm(error);
}
