import { cribTagSchema } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { TypedCodeForm } from '@/components/ui/typed-code-form';
import { useScannerWedge } from '@/hooks/use-scanner-wedge';
import { tagScan } from '../utils/tag-scan';
import type { CribScanners } from './scanners';

/**
 * Three ways to give a tool's tag, as for a badge: the camera, a hand scanner typing it, or the
 * tag typed on the screen. Whichever comes first is used.
 */
export function TagReader({ prompt, onTag, busy, Camera }: { prompt: string; onTag: (tag: string) => void; busy: boolean; Camera: CribScanners['Camera'] }) {
  const [typing, setTyping] = useState(false);
  const accept = (tag: string) => {
    if (!busy) onTag(tag);
  };
  useScannerWedge(accept, !typing, tagScan);

  return (
    <div className="flex w-full flex-col items-center gap-4">
      {typing ? (
        // A basket holds several tags: the field stays open for the next one.
        <TypedCodeForm
          label="Asset tag"
          submitLabel="Use this tag"
          cancelLabel="Close"
          autoCapitalize="characters"
          schema={cribTagSchema}
          invalidMessage="Type the tool’s tag."
          onCode={accept}
          onCancel={() => setTyping(false)}
          clearAfterCode
          disabled={busy}
        />
      ) : (
        <>
          <div className="flex aspect-[4/3] w-full max-w-[22rem] flex-col overflow-hidden rounded-2xl border-4 border-dashed border-ink-muted p-2">
            <Camera onCode={accept} unavailableText="No camera here. Scan or type the tag." />
          </div>
          <p className="flex items-center gap-4 text-center text-kiosk-body font-bold text-balance">
            <Icon name="wrench" className="size-10 shrink-0" />
            <span>{prompt}</span>
          </p>
          <Button variant="link" onClick={() => setTyping(true)}>
            <Icon name="keyboard" className="size-8" />
            Type tag
          </Button>
        </>
      )}
      {busy ? (
        <p className="flex items-center gap-3 text-kiosk-body">
          <Icon name="hourglass" className="size-8" />
          Looking up the tag…
        </p>
      ) : null}
    </div>
  );
}
