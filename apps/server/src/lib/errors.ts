/**
 * The one error type of the server. `operational` errors are expected outcomes (bad input, no
 * access, a conflict) and are answered as they are; anything else is a bug, answered as a bare 500.
 */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly options: {
      errors?: Record<string, string[]>;
      title?: string;
      operational?: boolean;
      headers?: Record<string, string>;
      /** Further members of the problem details (RFC 9457 §3.2), e.g. the reasons a start was refused. */
      extensions?: Record<string, unknown>;
    } = {},
  ) {
    super(message);
    this.name = 'AppError';
  }

  get operational(): boolean {
    return this.options.operational ?? true;
  }
}

export const badRequest = (code: string, message: string, errors?: Record<string, string[]>) =>
  new AppError(400, code, message, errors ? { errors } : {});
export const unauthenticated = () => new AppError(401, 'unauthenticated', 'Sign in to continue.');
export const forbidden = (message = 'You do not have permission to do that.') => new AppError(403, 'forbidden', message);
export const notFound = (code: string, message: string) => new AppError(404, code, message);
export const conflict = (code: string, message: string, errors?: Record<string, string[]>) =>
  new AppError(409, code, message, errors ? { errors } : {});

/** PostgreSQL SQLSTATE of a driver error, if it is one. */
export function pgCode(error: unknown): string | undefined {
  return typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string'
    ? error.code
    : undefined;
}
export const UNIQUE_VIOLATION = '23505';
/** An exclusion constraint refused the row: it overlaps one the constraint keeps apart. */
export const EXCLUSION_VIOLATION = '23P01';
