import { describe, expect, it } from 'vitest';
import { kioskAddress, openCodeUntil, stationState } from './station-status';

const now = new Date('2027-03-10T15:00:00.000Z');
const never = { pairedAt: null, revokedAt: null, pairingExpiresAt: null };

describe('the state of a station', () => {
  it('is waiting for pairing while its code can still be typed', () => {
    expect(stationState({ ...never, pairingExpiresAt: '2027-03-10T15:08:00.000Z' }, now)).toBe('waiting');
  });

  it('shows the code as expired once its ten minutes are over and no device used it', () => {
    expect(stationState({ ...never, pairingExpiresAt: '2027-03-10T14:58:00.000Z' }, now)).toBe('code-expired');
    expect(stationState({ ...never, pairingExpiresAt: '2027-03-10T15:00:00.000Z' }, now)).toBe('code-expired');
  });

  it('stays paired while a code for a replacement device is open', () => {
    expect(stationState({ ...never, pairedAt: '2027-03-01T09:00:00.000Z', pairingExpiresAt: '2027-03-10T15:05:00.000Z' }, now)).toBe('paired');
  });

  it('is revoked once revoked, even when it had been paired or has a new code waiting', () => {
    expect(
      stationState(
        { pairedAt: '2027-03-01T09:00:00.000Z', revokedAt: '2027-03-09T12:00:00.000Z', pairingExpiresAt: '2027-03-10T15:05:00.000Z' },
        now,
      ),
    ).toBe('revoked');
  });
});

describe('the open pairing code', () => {
  it('is given until its expiry while that lies ahead', () => {
    expect(openCodeUntil({ pairingExpiresAt: '2027-03-10T15:09:59.000Z' }, now)).toBe('2027-03-10T15:09:59.000Z');
  });

  it('is gone when there is no code or it has expired', () => {
    expect(openCodeUntil({ pairingExpiresAt: null }, now)).toBeNull();
    expect(openCodeUntil({ pairingExpiresAt: '2027-03-10T14:59:59.000Z' }, now)).toBeNull();
  });
});

describe('the address a device opens to pair', () => {
  it('is the station screen for machine and crib stations', () => {
    expect(kioskAddress('machine', 'https://shop.example.org')).toBe('https://shop.example.org/kiosk/station');
    expect(kioskAddress('crib', 'https://shop.example.org/')).toBe('https://shop.example.org/kiosk/station');
  });

  it('is the board screen for a wall board', () => {
    expect(kioskAddress('board', 'http://10.0.0.5:3000')).toBe('http://10.0.0.5:3000/kiosk/board');
  });
});
