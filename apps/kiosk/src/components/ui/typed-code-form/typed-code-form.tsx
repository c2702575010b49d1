import { useId, useRef, useState, type FormEvent } from 'react';
import type { ZodType } from 'zod';
import { FormActions } from '@/components/ui/form-actions';

interface TypedCodeFormProps {
  /** The field's visible label, also its accessible name. */
  label: string;
  submitLabel: string;
  cancelLabel: string;
  /** How an on-screen keyboard starts each letter: printed tags are upper case, badge codes mixed. */
  autoCapitalize: 'none' | 'characters';
  /** Reads what was typed; its first issue's message is shown when it refuses. */
  schema: ZodType<string, string>;
  /** Shown when the schema refuses without a message of its own. */
  invalidMessage: string;
  onCode: (code: string) => void;
  onCancel: () => void;
  /** Empties the field and keeps the focus in it after each code, for a field that stays open for the next one. */
  clearAfterCode?: boolean;
  disabled?: boolean;
}

/**
 * The on-screen field for a code whose QR will not read (a badge, a tool's tag): the code is
 * printed under the QR, so it can be typed instead.
 */
export function TypedCodeForm({ label, submitLabel, cancelLabel, autoCapitalize, schema, invalidMessage, onCode, onCancel, clearAfterCode = false, disabled }: TypedCodeFormProps) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [value, setValue] = useState('');
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = schema.safeParse(value);
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message ?? invalidMessage);
      return;
    }
    setError(null);
    onCode(parsed.data);
    if (clearAfterCode) {
      setValue('');
      input.current?.focus();
    }
  };

  return (
    <form onSubmit={submit} className="flex w-full max-w-3xl flex-col gap-4" noValidate>
      <label htmlFor={`${id}-code`} className="text-kiosk-body font-bold">
        {label}
      </label>
      <input
        ref={input}
        id={`${id}-code`}
        value={value}
        onChange={(event) => setValue(event.target.value)}
        autoFocus
        autoComplete="off"
        autoCapitalize={autoCapitalize}
        autoCorrect="off"
        spellCheck={false}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className="min-h-20 w-full rounded-lg border-4 border-ink-muted bg-surface-raised px-5 font-mono text-kiosk-body text-ink focus:border-ink focus:outline-none"
      />
      {error ? (
        <p id={`${id}-error`} className="text-kiosk-body font-bold text-link-down">
          {error}
        </p>
      ) : null}
      <FormActions submit={submitLabel} cancel={cancelLabel} onCancel={onCancel} disabled={disabled} />
    </form>
  );
}
