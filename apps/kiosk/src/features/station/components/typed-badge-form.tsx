import { badgeCodeSchema } from '@chuckkey/core';
import { useId, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';

/** The on-screen field for a badge whose QR will not read: the code is printed under it. */
export function TypedBadgeForm({ onCode, onCancel, disabled }: { onCode: (code: string) => void; onCancel: () => void; disabled?: boolean }) {
  const id = useId();
  const [value, setValue] = useState('');
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = badgeCodeSchema.safeParse(value);
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message ?? 'That is not a badge code.');
      return;
    }
    setError(null);
    onCode(parsed.data);
  };

  return (
    <form onSubmit={submit} className="flex w-full max-w-3xl flex-col gap-4" noValidate>
      <label htmlFor={`${id}-code`} className="text-kiosk-body font-bold">
        Badge code
      </label>
      <input
        id={`${id}-code`}
        value={value}
        onChange={(event) => setValue(event.target.value)}
        autoFocus
        autoComplete="off"
        autoCapitalize="none"
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
          Use this code
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
