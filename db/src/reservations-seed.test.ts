import { describe, expect, it } from 'vitest';
import { createMachine } from '../factories';
import { seed } from '../seeds/09_reservations';
import { ownMigratedDatabase } from './test-database';

const own = ownMigratedDatabase('reservations_seed');

describe('the demo shop’s reservable machines', () => {
  it('are the MIG welders and band saws, with the default booking rules; other machines stay walk-up only', async () => {
    const welder = await createMachine(own.db, { category: 'mig_welder' });
    const saw = await createMachine(own.db, { category: 'band_saw' });
    const lathe = await createMachine(own.db, { category: 'lathe' });

    await seed(own.db);

    const rows = await own.db('machines').whereIn('id', [welder.id, saw.id, lathe.id]).select('id', 'reservable', 'slot_minutes', 'check_in_minutes', 'no_show_grace_minutes');
    const byId = new Map(rows.map((row) => [row.id, row]));
    expect(byId.get(welder.id)).toMatchObject({ reservable: true, slot_minutes: 15, check_in_minutes: 10, no_show_grace_minutes: 15 });
    expect(byId.get(saw.id)).toMatchObject({ reservable: true });
    expect(byId.get(lathe.id)).toMatchObject({ reservable: false });
  });
});
