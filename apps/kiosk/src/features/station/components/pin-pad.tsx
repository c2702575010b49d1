import { useId, useState, type ReactNode } from 'react';

const MIN_DIGITS = 4;
const MAX_DIGITS = 6;
const DIGITS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;

const keyClass =
  'flex min-h-18 min-w-24 items-center justify-center rounded-xl bg-surface-raised font-bold text-ink hover:bg-brand focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-ink active:bg-brand disabled:opacity-40';
const digitKey = `${keyClass} text-kiosk-display`;
const wordKey = `${keyClass} text-kiosk-body`;

/**
 * Large digits for a PIN of 4 to 6; the digits typed show only as dots. `aside` goes beside the
 * keys on a landscape screen and above them on a portrait one.
 */
export function PinPad({
  onSubmit,
  disabled = false,
  label,
  aside,
}: {
  onSubmit: (pin: string) => void;
  disabled?: boolean;
  label: string;
  aside?: ReactNode;
}) {
  const labelId = useId();
  const [pin, setPin] = useState('');
  const press = (digit: string) => setPin((current) => (current.length < MAX_DIGITS ? current + digit : current));

  return (
    <div className="grid w-full items-center justify-items-center gap-6 landscape:grid-cols-2">
      <div className="flex flex-col items-center gap-6">
        {aside}
        <p id={labelId} className="sr-only">
          {label}
        </p>
        <output aria-labelledby={labelId} aria-live="polite" className="flex min-h-16 items-center gap-4 rounded-lg border-4 border-ink-muted px-8">
          <span className="sr-only">{pin.length === 1 ? '1 digit entered' : `${pin.length} digits entered`}</span>
          {Array.from({ length: MAX_DIGITS }, (_, i) => (
            <span
              key={i}
              aria-hidden="true"
              className={`inline-block size-6 rounded-full border-2 border-ink ${i < pin.length ? 'bg-ink' : 'bg-transparent'} ${i >= MIN_DIGITS && i >= pin.length ? 'opacity-40' : ''}`}
            />
          ))}
        </output>
      </div>
      <div className="grid grid-cols-3 gap-3" role="group" aria-label="PIN digits">
        {DIGITS.map((digit) => (
          <button key={digit} type="button" className={digitKey} onClick={() => press(digit)} disabled={disabled}>
            {digit}
          </button>
        ))}
        <button type="button" className={wordKey} onClick={() => setPin((current) => current.slice(0, -1))} disabled={disabled || !pin}>
          Delete
        </button>
        <button type="button" className={digitKey} onClick={() => press('0')} disabled={disabled}>
          0
        </button>
        <button
          type="button"
          className={wordKey}
          onClick={() => {
            onSubmit(pin);
            setPin('');
          }}
          disabled={disabled || pin.length < MIN_DIGITS}
        >
          OK
        </button>
      </div>
    </div>
  );
}
