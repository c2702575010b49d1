import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError, errorMessage } from './api-client';

export interface ServerErrorOptions<F extends string> {
  /** Codes that concern one field even when the server names none, e.g. `email_taken` → `email`. */
  codeFields?: Partial<Record<string, F>>;
  /** Better words than the server's for codes this form expects. */
  messages?: Record<string, string>;
}

export interface SplitServerErrors<F extends string> {
  fields: Partial<Record<F, string>>;
  /** What belongs to no field of the form and goes in an alert above it; null when nothing does. */
  message: string | null;
}

/** Sorts a failed submit into messages under the form's own fields and one for the whole form. */
export function splitServerErrors<F extends string>(
  error: unknown,
  fields: readonly F[],
  options: ServerErrorOptions<F> = {},
): SplitServerErrors<F> {
  if (!(error instanceof ApiError)) return { fields: {}, message: errorMessage(error) };

  const known = new Set<string>(fields);
  const byField: Partial<Record<F, string>> = {};
  const leftovers: string[] = [];
  for (const [field, messages] of Object.entries(error.fieldErrors)) {
    if (known.has(field)) byField[field as F] = messages.join(' ');
    else leftovers.push(...messages);
  }

  const text = options.messages?.[error.code] ?? error.message;
  const codeField = options.codeFields?.[error.code];
  if (codeField && byField[codeField] === undefined && Object.keys(byField).length === 0) {
    byField[codeField] = text;
  }

  if (leftovers.length > 0) return { fields: byField, message: leftovers.join(' ') };
  return { fields: byField, message: Object.keys(byField).length > 0 ? null : text };
}

/** Puts the server's field errors on a react-hook-form form and returns the form-level message. */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
  options: ServerErrorOptions<Path<T>> = {},
): string | null {
  const split = splitServerErrors(error, fields, options);
  let first = true;
  for (const field of fields) {
    const message = split.fields[field];
    if (message === undefined) continue;
    setError(field, { type: 'server', message }, { shouldFocus: first });
    first = false;
  }
  return split.message;
}
