import type { Knex } from 'knex';
import { createArea, ensureShop } from '../factories';

// The demo shop is invented: an invented collective in an invented town.
export const demoShop = {
  name: 'Quillmere Forge & Lathe Collective',
  town: 'Quillmere',
  time_zone: 'America/Chicago',
};

export const demoAreas = ['Turning bay', 'Milling & drilling', 'Welding bay', 'Cutting & grinding'];

export async function seed(knex: Knex): Promise<void> {
  await ensureShop(knex, demoShop);
  for (const [index, name] of demoAreas.entries()) {
    await createArea(knex, { name, sort_order: index });
  }
}
