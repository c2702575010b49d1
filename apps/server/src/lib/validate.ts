import type { z, ZodError } from 'zod';

export function zodFieldErrors(error: ZodError): Record<string, string[]> {
  const errors: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    (errors[key] ??= []).push(issue.message);
  }
  return errors;
}

export type Location = 'body' | 'query' | 'params';

export class ValidationError extends Error {
  constructor(
    readonly location: Location,
    readonly errors: Record<string, string[]>,
  ) {
    super(`invalid ${location}`);
  }
}

/** Parses one part of a request with its schema and returns zod's parsed output. */
export function parse<S extends z.ZodType>(schema: S, data: unknown, location: Location): z.output<S> {
  const result = schema.safeParse(data ?? {});
  if (!result.success) throw new ValidationError(location, zodFieldErrors(result.error));
  return result.data;
}
