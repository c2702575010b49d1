import type { Station } from '@chuckkey/core';

export type StationState = 'paired' | 'waiting' | 'code-expired' | 'revoked';

export const stationKindLabels: Record<Station['kind'], string> = {
  machine: 'Machine station',
  crib: 'Crib station',
  board: 'Wall board',
};

export const stationStateLabels: Record<StationState, string> = {
  paired: 'Paired',
  waiting: 'Waiting for pairing',
  'code-expired': 'Code expired',
  revoked: 'Revoked',
};

type PairingFacts = Pick<Station, 'pairedAt' | 'revokedAt' | 'pairingExpiresAt'>;

/** When the code handed out last stops working, or null when no code can be used any more. */
export function openCodeUntil(station: Pick<Station, 'pairingExpiresAt'>, now: Date): string | null {
  if (!station.pairingExpiresAt) return null;
  const expires = Date.parse(station.pairingExpiresAt);
  return Number.isNaN(expires) || expires <= now.getTime() ? null : station.pairingExpiresAt;
}

/**
 * Revoked wins over everything: the device is refused even while a new code waits. A station
 * that was paired once stays paired while a code for a replacement device is open.
 */
export function stationState(station: PairingFacts, now: Date): StationState {
  if (station.revokedAt) return 'revoked';
  if (station.pairedAt) return 'paired';
  return openCodeUntil(station, now) ? 'waiting' : 'code-expired';
}

/** Where the device goes to type its code: wall boards have a screen of their own. */
export function kioskAddress(kind: Station['kind'], origin: string): string {
  return `${origin.replace(/\/+$/, '')}/kiosk/${kind === 'board' ? 'board' : 'station'}`;
}
