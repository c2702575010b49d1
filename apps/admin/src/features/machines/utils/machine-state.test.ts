import type { BoardMachine } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { machineStateDetail, machineStateLabels, statesById, supervisorLine } from './machine-state';

const clock = (iso: string) => iso.slice(11, 16);

const mill: BoardMachine = {
  id: '0d6f3a1e-8b2c-4f5d-9e7a-1c3b5d7f9a2e',
  name: 'Knee mill',
  category: 'mill',
  state: 'available',
  member: null,
  startedAt: null,
  nextReservationAt: null,
  tagOut: null,
};

describe('machine state on the shop floor', () => {
  it('uses the wall board’s words for every state', () => {
    expect(Object.values(machineStateLabels)).toEqual(['Available', 'In use', 'Reserved next', 'Tagged out', 'Offline']);
  });

  it('shows who is on a machine in use, by first name and last initial, and since when', () => {
    const detail = machineStateDetail(
      { ...mill, state: 'in_use', member: { firstName: 'Peregrine', lastInitial: 'V' }, startedAt: '2027-03-05T14:05:00.000Z' },
      clock,
    );

    expect(detail).toBe('Peregrine V., since 14:05');
  });

  it('gives a tag-out’s reason and since when', () => {
    const detail = machineStateDetail(
      { ...mill, state: 'tagged_out', tagOut: { reason: 'Quill feed slips', since: '2027-03-05T09:12:00.000Z' } },
      clock,
    );

    expect(detail).toBe('Quill feed slips (since 09:12)');
  });

  it('says an offline machine’s station is not reporting', () => {
    expect(machineStateDetail({ ...mill, state: 'offline' }, clock)).toBe('The station is not reporting');
  });

  it('shows an available machine’s next reservation, and nothing when there is none', () => {
    expect(machineStateDetail({ ...mill, nextReservationAt: '2027-03-06T15:00:00.000Z' }, clock)).toBe('Next reservation 15:00');
    expect(machineStateDetail(mill, clock)).toBe('');
  });

  it('names the supervisor on duty by first name and last initial, or says there is none', () => {
    expect(supervisorLine({ firstName: 'Isolde', lastInitial: 'K' })).toBe('Supervisor on duty: Isolde K.');
    expect(supervisorLine(null)).toBe('No supervisor on duty');
  });

  it('finds each machine’s state by its id across the areas', () => {
    const lathe = { ...mill, id: '5b8e2d4a-6c1f-4a3e-8d9b-7f2e4c6a8b1d', name: 'Lathe 1', state: 'in_use' as const };
    const found = statesById([{ machines: [mill] }, { machines: [lathe] }]);

    expect(found.get(lathe.id)?.state).toBe('in_use');
    expect(found.get(mill.id)?.state).toBe('available');
    expect(found.size).toBe(2);
  });
});
