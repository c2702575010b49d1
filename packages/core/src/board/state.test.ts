import { describe, expect, it } from 'vitest';
import { HEARTBEAT_SILENCE_MINUTES } from '../stations/check-in';
import { lastInitial, machineBoardState, type MachineStateFacts } from './state';

const NOW = new Date('2026-12-02T15:00:00Z');
const ago = (minutes: number) => new Date(NOW.getTime() - minutes * 60_000);
const idle: MachineStateFacts = { tagOut: null, sessionRunning: false, stations: 1, lastHeardAt: ago(0.5) };

describe('a machine on the board', () => {
  const reservation = (startsInMinutes: number, minutes = 60, checkInMinutes = 10) => ({
    startsAt: new Date(NOW.getTime() + startsInMinutes * 60_000),
    endsAt: new Date(NOW.getTime() + (startsInMinutes + minutes) * 60_000),
    checkInMinutes,
  });

  it('is reserved from the start of the check-in window until the reservation ends, not before', () => {
    expect(machineBoardState({ ...idle, nextReservation: reservation(10) }, NOW)).toBe('reserved');
    expect(machineBoardState({ ...idle, nextReservation: reservation(-30) }, NOW)).toBe('reserved');
    expect(machineBoardState({ ...idle, nextReservation: reservation(11) }, NOW)).toBe('available');
    expect(machineBoardState({ ...idle, nextReservation: reservation(-60) }, NOW)).toBe('available');
  });

  it('shows a tag-out or a running session over a reservation due now', () => {
    expect(machineBoardState({ ...idle, sessionRunning: true, nextReservation: reservation(5) }, NOW)).toBe('in_use');
    expect(machineBoardState({ ...idle, tagOut: { reason: 'Liner worn.' }, nextReservation: reservation(5) }, NOW)).toBe('tagged_out');
  });

  it('is available when free and its station reports', () => {
    expect(machineBoardState(idle, NOW)).toBe('available');
  });

  it('is in use while a session runs', () => {
    expect(machineBoardState({ ...idle, sessionRunning: true }, NOW)).toBe('in_use');
  });

  it('is tagged out while a tag-out is open, even with a session running and its station silent', () => {
    expect(machineBoardState({ tagOut: { reason: 'Chuck guard cracked.' }, sessionRunning: true, stations: 1, lastHeardAt: ago(60) }, NOW)).toBe('tagged_out');
  });

  it('is offline once every station has been silent longer than the heartbeat limit', () => {
    expect(machineBoardState({ ...idle, lastHeardAt: ago(HEARTBEAT_SILENCE_MINUTES + 0.1) }, NOW)).toBe('offline');
    expect(machineBoardState({ ...idle, stations: 2, lastHeardAt: null }, NOW)).toBe('offline');
  });

  it('is still available at exactly the heartbeat limit', () => {
    expect(machineBoardState({ ...idle, lastHeardAt: ago(HEARTBEAT_SILENCE_MINUTES) }, NOW)).toBe('available');
  });

  it('shows a running session before a silent station: the session is closed by the job, not hidden', () => {
    expect(machineBoardState({ ...idle, sessionRunning: true, lastHeardAt: ago(30) }, NOW)).toBe('in_use');
  });

  it('is available without any station, however long ago anything was heard', () => {
    expect(machineBoardState({ ...idle, stations: 0, lastHeardAt: null }, NOW)).toBe('available');
  });
});

describe('the last initial', () => {
  it('is the first letter, upper-cased, with spaces ignored', () => {
    expect(lastInitial('  van Dijk')).toBe('V');
    expect(lastInitial('Øverby')).toBe('Ø');
  });

  it('keeps a letter outside the Basic Multilingual Plane whole', () => {
    expect(lastInitial('𝒜lder')).toBe('𝒜');
  });

  it('is empty for an empty last name', () => {
    expect(lastInitial('')).toBe('');
  });
});
