import { badgeCodeSchema } from '@chuckkey/core';
import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { TypedCodeForm } from '@/components/ui/typed-code-form';
import { useScannerWedge } from '@/hooks/use-scanner-wedge';
import { BadgeCamera } from './badge-camera';

interface BadgeReaderProps {
  prompt: string;
  onBadge: (code: string) => void;
  /** While a scan is being looked up, further scans wait. */
  busy?: boolean;
  /** What went wrong with the last scan, in words. */
  message?: ReactNode;
  /** Off where the screen has other work (a running session): the scanner and the typed code still work. */
  camera?: boolean;
}

/**
 * Three ways to give a badge: the camera inside the outline, a hand scanner typing the code,
 * or the code typed on the screen. Whichever comes first is used.
 */
export function BadgeReader({ prompt, onBadge, busy = false, message, camera = true }: BadgeReaderProps) {
  const [typing, setTyping] = useState(false);
  const accept = (code: string) => {
    if (!busy) onBadge(code);
  };
  useScannerWedge(accept, !typing);

  return (
    <div className="flex w-full flex-col items-center gap-5">
      {typing ? (
        <TypedCodeForm
          label="Badge code"
          submitLabel="Use this code"
          cancelLabel="Cancel"
          autoCapitalize="none"
          schema={badgeCodeSchema}
          invalidMessage="That is not a badge code."
          onCode={accept}
          onCancel={() => setTyping(false)}
          disabled={busy}
        />
      ) : (
        <>
          {/* The outline has the proportions of the badge card (ISO/IEC 7810 ID-1, 85.60 × 53.98 mm). */}
          {camera ? (
            <div className="flex aspect-[85.6/53.98] w-full max-w-[28rem] flex-col overflow-hidden rounded-2xl border-4 border-dashed border-ink-muted p-3">
              <BadgeCamera onCode={accept} />
            </div>
          ) : null}
          <p className="flex items-center gap-4 text-center text-kiosk-lead font-bold text-balance">
            <Icon name="badge" className="size-12" />
            <span>{prompt}</span>
          </p>
          <Button variant="link" onClick={() => setTyping(true)}>
            <Icon name="keyboard" className="size-8" />
            Type badge code
          </Button>
        </>
      )}
      {busy ? (
        <p role="status" className="flex items-center gap-3 text-kiosk-body">
          <Icon name="hourglass" className="size-8" />
          Reading the badge…
        </p>
      ) : null}
      {message && !busy ? (
        <div role="alert" className="flex items-center gap-4 rounded-lg border-2 border-link-down px-6 py-4 text-kiosk-body">
          <Icon name="warning" className="size-9 text-link-down" />
          <div>{message}</div>
        </div>
      ) : null}
    </div>
  );
}
