import type { LinkStatus } from '@chuckkey/core';

/** A quiet dot while the live link holds; words only when it drops, so the room notices. */
export function ConnectionDot({ status }: { status: LinkStatus }) {
  if (status === 'reconnecting') {
    return (
      <p role="status" className="flex items-center gap-3 text-board-strip font-bold whitespace-nowrap">
        <span aria-hidden="true" className="inline-block size-[0.6em] animate-pulse rounded-full bg-link-down" />
        Reconnecting…
      </p>
    );
  }

  return (
    <p role="status" className="flex items-center">
      <span
        aria-hidden="true"
        className={`inline-block size-[1.5vw] min-h-4 min-w-4 rounded-full bg-link-up ${status === 'connecting' ? 'opacity-40' : ''}`}
      />
      <span className="sr-only">{status === 'connecting' ? 'Connecting…' : 'Connected'}</span>
    </p>
  );
}
