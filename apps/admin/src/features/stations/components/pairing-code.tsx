import { PAIRING_MINUTES, type StationWithCode } from '@chuckkey/core';
import { useEffect, useId, useRef } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { formatDateTime } from '../../../lib/format';
import { kioskAddress } from '../utils/station-status';

interface PairingCodeProps {
  station: StationWithCode;
  timeZone: string | undefined;
  onDone: () => void;
}

/** The code, large enough to read across a bench, and what to do with it on the device. */
export function PairingCode({ station, timeZone, onDone }: PairingCodeProps) {
  const codeRef = useRef<HTMLDivElement>(null);
  const labelId = useId();
  const address = kioskAddress(station.kind, window.location.origin);

  // The form that asked for the code is gone; the code is what the admin came for.
  useEffect(() => {
    codeRef.current?.focus();
  }, []);

  return (
    <div className="flex flex-col gap-4">
      <div
        ref={codeRef}
        tabIndex={-1}
        role="group"
        aria-labelledby={labelId}
        className="flex flex-col items-center gap-1 rounded-lg border-2 border-brand bg-brand-soft px-3 py-5"
      >
        <p id={labelId} className="font-bold text-neutral-800">
          Pairing code
        </p>
        <p className="font-mono text-4xl font-bold tracking-[0.2em] text-neutral-900 sm:text-6xl">{station.pairingCode}</p>
        <p className="sr-only">Letter by letter: {station.pairingCode.split('').join(' ')}</p>
      </div>
      <ol className="flex list-decimal flex-col gap-2 pl-6 text-neutral-900">
        <li>
          On the kiosk device, open <span className="font-mono font-bold break-all">{address}</span>.
        </li>
        <li>
          Type this code within {PAIRING_MINUTES} minutes. It works once.
        </li>
      </ol>
      {station.pairingExpiresAt && (
        <p className="text-neutral-800">
          It stops working at <time dateTime={station.pairingExpiresAt} className="font-bold">{formatDateTime(station.pairingExpiresAt, timeZone)}</time>.
          After that, ask for a new pairing code here.
        </p>
      )}
      {station.kind === 'machine' && station.machine && (
        <p className="text-neutral-800">
          Pair the device that stands at {station.machine.name}: it clears members for that machine only.
        </p>
      )}
      {station.pairedAt && !station.revokedAt && (
        <p className="text-neutral-800">The device paired now keeps working until this code is used; then the new device takes its place.</p>
      )}
      {station.revokedAt && <p className="text-neutral-800">Pairing a device with this code brings the revoked station back into use.</p>}
      <div>
        <Button onClick={onDone}>Done</Button>
      </div>
    </div>
  );
}

export function pairingCodeTitle(station: Pick<StationWithCode, 'name'>): string {
  return `Pairing code for ${station.name}`;
}

interface PairingCodeDialogProps {
  station: StationWithCode | null;
  timeZone: string | undefined;
  onClose: () => void;
}

export function PairingCodeDialog({ station, timeZone, onClose }: PairingCodeDialogProps) {
  return (
    <Dialog open={station !== null} title={station ? pairingCodeTitle(station) : ''} onClose={onClose}>
      {station && <PairingCode key={station.pairingCode} station={station} timeZone={timeZone} onDone={onClose} />}
    </Dialog>
  );
}
