import { useEffect, useEffectEvent } from 'react';
import { badgeScan, emptyBurst, feedKey, type ScanShape } from '@/lib/keystroke-burst';

function isTypingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

/**
 * Listens for a USB or Bluetooth scanner that types a code and Enter (a badge's, unless `shape`
 * says otherwise). Keys typed into a field are the field's, so the on-screen code field and the
 * scanner never fight.
 */
export function useScannerWedge(onCode: (code: string) => void, enabled = true, shape: ScanShape = badgeScan) {
  const emit = useEffectEvent(onCode);

  useEffect(() => {
    if (!enabled) return;
    let burst = emptyBurst;
    const onKeyDown = (event: KeyboardEvent) => {
      if (isTypingTarget(event.target) || event.ctrlKey || event.altKey || event.metaKey) return;
      const result = feedKey(burst, event.key, event.timeStamp, shape);
      burst = result.burst;
      if (result.code) {
        event.preventDefault();
        emit(result.code);
      }
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [enabled, shape]);
}
