import type { Station } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { machineChoices } from './machine-choices';

const lathe = { id: '5b1f6a52-8f0e-4b39-9a43-3c8a4e1d2f01', name: 'Lathe 10' };
const lathe2 = { id: '5b1f6a52-8f0e-4b39-9a43-3c8a4e1d2f02', name: 'Lathe 2' };
const mill = { id: '5b1f6a52-8f0e-4b39-9a43-3c8a4e1d2f03', name: 'Mill' };

function stationAt(machine: { id: string; name: string }, revokedAt: string | null = null): Station {
  return {
    id: '7c2e9d14-1a5b-4c3d-8e6f-0a1b2c3d4e5f',
    kind: 'machine',
    name: machine.name,
    machine,
    pairedAt: '2027-03-01T09:00:00.000Z',
    lastSeenAt: '2027-03-10T14:59:00.000Z',
    revokedAt,
    pairingExpiresAt: null,
  };
}

describe('the machines offered for a new station', () => {
  it('come in name order, numbers counted as numbers', () => {
    expect(machineChoices([mill, lathe, lathe2], []).map((choice) => choice.label)).toEqual(['Lathe 2', 'Lathe 10', 'Mill']);
  });

  it('mark a machine that already has a working station', () => {
    expect(machineChoices([mill, lathe], [stationAt(mill)])).toEqual([
      { id: lathe.id, label: 'Lathe 10' },
      { id: mill.id, label: 'Mill (has a station)' },
    ]);
  });

  it('do not count a revoked station as one the machine has', () => {
    expect(machineChoices([mill], [stationAt(mill, '2027-03-09T12:00:00.000Z')])).toEqual([{ id: mill.id, label: 'Mill' }]);
  });
});
