import { cribTagSchema } from '@chuckkey/core';
import { useId, useRef, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';

/** The on-screen field for a tag whose label will not scan: the tag is printed under its QR. */
export function TypedTagForm({ onTag, onClose, disabled }: { onTag: (tag: string) => void; onClose: () => void; disabled?: boolean }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [value, setValue] = useState('');
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = cribTagSchema.safeParse(value);
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message ?? 'Type the tool’s tag.');
      return;
    }
    setError(null);
    onTag(parsed.data);
    // The field stays open for the next tag.
    setValue('');
    input.current?.focus();
  };

  return (
    <form onSubmit={submit} className="flex w-full max-w-3xl flex-col gap-4" noValidate>
      <label htmlFor={`${id}-tag`} className="text-kiosk-body font-bold">
        Asset tag
      </label>
      <input
        ref={input}
        id={`${id}-tag`}
        value={value}
        onChange={(event) => setValue(event.target.value)}
        autoFocus
        autoComplete="off"
        autoCapitalize="characters"
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
      <div className="flex flex-wrap gap-4">
        <Button type="submit" disabled={disabled}>
          Use this tag
        </Button>
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </div>
    </form>
  );
}
