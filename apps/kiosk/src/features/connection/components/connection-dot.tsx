import { useHealth } from '../api/get-health';

/** A quiet dot while the server answers; words only when the link drops, so the room notices. */
export function ConnectionDot() {
  const health = useHealth();

  if (health.isError) {
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
        className={`inline-block size-[1.5vw] min-h-4 min-w-4 rounded-full bg-link-up ${health.isPending ? 'opacity-40' : ''}`}
      />
      <span className="sr-only">{health.isPending ? 'Connecting…' : 'Connected'}</span>
    </p>
  );
}
