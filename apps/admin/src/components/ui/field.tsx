import { useId, type ReactNode } from 'react';
import { ErrorIcon } from './icons';

export interface FieldIds {
  control: string;
  hint: string;
  error: string;
}

export function useFieldIds(id?: string): FieldIds {
  const auto = useId();
  const control = id ?? auto;
  return { control, hint: `${control}-hint`, error: `${control}-error` };
}

/** The attributes that tie a control to its hint and its error, so screen readers read both. */
export function describedBy(ids: FieldIds, hint: ReactNode, error: string | undefined) {
  const described = [hint ? ids.hint : null, error ? ids.error : null].filter(Boolean).join(' ');
  return {
    'aria-describedby': described || undefined,
    'aria-invalid': error ? true : undefined,
  } as const;
}

interface FieldShellProps {
  ids: FieldIds;
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  className?: string | undefined;
  children: ReactNode;
}

export function FieldShell({ ids, label, hint, error, className, children }: FieldShellProps) {
  return (
    <div className={className ?? 'flex flex-col gap-1.5'}>
      <label htmlFor={ids.control} className="font-bold text-neutral-900">
        {label}
      </label>
      {hint && (
        <p id={ids.hint} className="text-sm text-neutral-600">
          {hint}
        </p>
      )}
      {children}
      {error && <FieldError id={ids.error}>{error}</FieldError>}
    </div>
  );
}

export function FieldError({ id, children }: { id: string; children: ReactNode }) {
  return (
    <p id={id} className="flex items-start gap-1.5 text-sm font-bold text-danger">
      <ErrorIcon className="mt-px size-4 shrink-0" />
      <span>{children}</span>
    </p>
  );
}

export const controlClasses =
  'min-h-11 w-full rounded-md border border-neutral-500 bg-white px-3 py-2 text-base text-neutral-900 ' +
  'placeholder:text-neutral-500 aria-invalid:border-2 aria-invalid:border-danger disabled:bg-neutral-100 md:min-h-10';
