import { useIdleReturn } from '@/hooks/use-idle-return';

/**
 * The idle return as a component: given a new `key` on each scan, its timer starts again, since
 * a camera scan is work at the screen even though nobody touched it.
 */
export function IdleTimer({ ms, onIdle }: { ms: number; onIdle: () => void }) {
  useIdleReturn(ms, onIdle);
  return null;
}
