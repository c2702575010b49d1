import { useState } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { applyServerErrors, type ServerErrorOptions } from '../lib/form-errors';

/**
 * What a form does with a refused submit: the server's field errors go under the form's own
 * fields, focusing the first, and whatever belongs to no field goes in the alert above it.
 */
export function useServerErrors<T extends FieldValues>(
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
  options?: ServerErrorOptions<Path<T>>,
) {
  const [formError, setFormError] = useState<string | null>(null);
  return {
    /** The alert above the form; null while there is nothing to say. */
    formError,
    /** For a message of the form's own, or null to clear the alert as a new submit starts. */
    setFormError,
    showServerError: (error: unknown) => setFormError(applyServerErrors(error, setError, fields, options)),
  };
}
