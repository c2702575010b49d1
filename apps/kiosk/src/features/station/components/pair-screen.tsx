import { PAIRING_CODE_LENGTH, pairSchema } from '@chuckkey/core';
import { useId, useState, type FormEvent } from 'react';
import { Icon } from '@/components/ui/icon';
import { isApiError } from '@/lib/api-client';
import { usePairStation } from '../api/pair-station';

function pairingMessage(error: unknown): string {
  if (isApiError(error, 429)) return 'Too many tries from this screen. Wait 15 minutes, then try again.';
  if (isApiError(error, 0)) return 'The shop’s server does not answer. Try again in a moment.';
  if (isApiError(error)) return error.message;
  return 'Something went wrong. Try again.';
}

interface PairScreenProps {
  shopName: string;
  /** What the screen is once paired, for the sentence on what pairing does. */
  becomes?: string;
}

/** The code field and what pairing does; the code is sent as soon as all 8 characters are in. */
export function PairScreen({ shopName, becomes = 'a machine’s station' }: PairScreenProps) {
  const id = useId();
  const pair = usePairStation();
  const [code, setCode] = useState('');

  const send = (value: string) => {
    const parsed = pairSchema.safeParse({ pairingCode: value });
    if (parsed.success && parsed.data.pairingCode.length === PAIRING_CODE_LENGTH && !pair.isPending) pair.mutate(parsed.data.pairingCode);
  };

  const change = (value: string) => {
    const cleaned = value.toUpperCase().replace(/[^A-Z0-9]/g, '').slice(0, PAIRING_CODE_LENGTH);
    setCode(cleaned);
    if (cleaned.length === PAIRING_CODE_LENGTH) send(cleaned);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    send(code);
  };

  return (
    <form onSubmit={submit} className="flex max-w-[44ch] flex-col items-center gap-8 text-center" noValidate>
      <h1 className="text-kiosk-title font-bold text-balance">{shopName}</h1>
      <p id={`${id}-what`} className="text-kiosk-lead text-balance">
        This screen becomes {becomes} once an admin pairs it: type the 8-character pairing code the admin gives you.
      </p>
      <div className="flex flex-col items-center gap-3">
        <label htmlFor={`${id}-code`} className="text-kiosk-body font-bold">
          Pairing code
        </label>
        <input
          id={`${id}-code`}
          value={code}
          onChange={(event) => change(event.target.value)}
          readOnly={pair.isPending}
          autoFocus
          autoComplete="off"
          autoCapitalize="characters"
          autoCorrect="off"
          spellCheck={false}
          inputMode="text"
          size={PAIRING_CODE_LENGTH}
          maxLength={PAIRING_CODE_LENGTH + 1}
          aria-describedby={pair.isError ? `${id}-what ${id}-error` : `${id}-what`}
          aria-invalid={pair.isError ? true : undefined}
          className="min-h-24 w-[8.5em] rounded-xl border-4 border-ink-muted bg-surface-raised px-4 text-center font-mono text-kiosk-display tracking-[0.2em] text-ink uppercase focus:border-ink focus:outline-none"
        />
      </div>
      {pair.isPending ? (
        <p role="status" className="flex items-center gap-3 text-kiosk-body">
          <Icon name="hourglass" className="size-8" />
          Pairing…
        </p>
      ) : null}
      {pair.isError ? (
        <p id={`${id}-error`} role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
          <Icon name="warning" className="size-9" />
          {pairingMessage(pair.error)}
        </p>
      ) : null}
    </form>
  );
}
