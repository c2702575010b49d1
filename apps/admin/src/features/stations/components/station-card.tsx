import type { Station } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import { formatDateTime } from '../../../lib/format';
import { openCodeUntil, stationKindLabels, stationState } from '../utils/station-status';
import { timeAgo } from '../utils/time-ago';
import { StationStateBadge } from './station-state-badge';

export function stationHeadingId(station: Pick<Station, 'id'>): string {
  return `station-${station.id}`;
}

export function newCodeButtonId(station: Pick<Station, 'id'>): string {
  return `station-${station.id}-new-code`;
}

function kindLine(station: Station): string {
  const kind = stationKindLabels[station.kind];
  return station.machine && station.machine.name !== station.name ? `${kind} at ${station.machine.name}` : kind;
}

/** Relative words for a quick read; the exact time for whoever needs it, hovering or listening. */
function When({ iso, now, timeZone }: { iso: string; now: Date; timeZone: string | undefined }) {
  const exact = formatDateTime(iso, timeZone);
  return (
    <time dateTime={iso} title={exact}>
      {timeAgo(iso, now)}
      <span className="sr-only"> ({exact})</span>
    </time>
  );
}

interface StationCardProps {
  station: Station;
  now: Date;
  timeZone: string | undefined;
  newCodePending: boolean;
  /** Why the last request for a new code failed, shown in this card. */
  newCodeError: ReactNode;
  onNewCode: (station: Station) => void;
  onRevoke: (station: Station) => void;
}

export function StationCard({ station, now, timeZone, newCodePending, newCodeError, onNewCode, onRevoke }: StationCardProps) {
  const headingId = stationHeadingId(station);
  const state = stationState(station, now);
  const codeUntil = openCodeUntil(station, now);
  return (
    <article
      aria-labelledby={headingId}
      className={cn('flex h-full flex-col gap-3 rounded-lg border p-4', state === 'revoked' ? 'border-neutral-300 bg-neutral-50' : 'border-neutral-300 bg-white')}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="flex min-w-0 flex-col">
          <h3 id={headingId} tabIndex={-1} className="text-lg font-bold break-words text-neutral-900">
            {station.name}
          </h3>
          <p className="text-neutral-700">{kindLine(station)}</p>
        </div>
        <StationStateBadge state={state} />
      </div>
      <dl className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
        <dt className="text-neutral-700">Last contact</dt>
        <dd>{station.lastSeenAt ? <When iso={station.lastSeenAt} now={now} timeZone={timeZone} /> : 'Never'}</dd>
        {station.pairedAt && (
          <>
            <dt className="text-neutral-700">Paired on</dt>
            <dd>
              <time dateTime={station.pairedAt}>{formatDateTime(station.pairedAt, timeZone)}</time>
            </dd>
          </>
        )}
        {station.revokedAt && (
          <>
            <dt className="text-neutral-700">Revoked on</dt>
            <dd>
              <time dateTime={station.revokedAt}>{formatDateTime(station.revokedAt, timeZone)}</time>
            </dd>
          </>
        )}
        {codeUntil && (
          <>
            <dt className="text-neutral-700">Pairing code</dt>
            <dd>
              Open until <time dateTime={codeUntil}>{formatDateTime(codeUntil, timeZone)}</time>
            </dd>
          </>
        )}
      </dl>
      {state === 'code-expired' && (
        <p className="text-neutral-800">No device used the code in time. Get a new pairing code to pair one.</p>
      )}
      {state === 'revoked' && <p className="text-neutral-800">No device can use this station. A new pairing code brings it back into use.</p>}
      {newCodeError}
      <div className="mt-auto flex flex-wrap gap-2">
        <Button id={newCodeButtonId(station)} variant="secondary" pending={newCodePending} onClick={() => onNewCode(station)}>
          New pairing code<span className="sr-only"> for {station.name}</span>
        </Button>
        {state !== 'revoked' && (
          <Button variant="secondary" onClick={() => onRevoke(station)}>
            Revoke<span className="sr-only"> {station.name}</span>
          </Button>
        )}
      </div>
    </article>
  );
}
