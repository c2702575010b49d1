import type { Knex } from 'knex';
import type { Role } from '@chuckkey/core';
import { createMember } from '../factories';

export const DEMO_PASSWORD = 'chuckkey-demo';

/** The three accounts README lists; everyone else in the demo shop shares the same password. */
export const demoAccounts: { email: string; first_name: string; last_name: string; role: Role }[] = [
  { email: 'admin@example.org', first_name: 'Marguerite', last_name: 'Okonkwo-Hale', role: 'admin' },
  { email: 'instructor@example.org', first_name: 'Tobias', last_name: 'Verhoeven', role: 'instructor' },
  { email: 'member@example.org', first_name: 'Priya', last_name: 'Castellanos', role: 'member' },
];

// Invented people: first and last names paired at random-looking steps so no pairing is meant
// to be anyone.
const firstNames = [
  'Ansel', 'Bettina', 'Corwin', 'Delphine', 'Emrys', 'Fenna', 'Gideon', 'Harriet', 'Idris', 'Juniper',
  'Kasimir', 'Linnea', 'Mateo', 'Noor', 'Orson', 'Perpetua', 'Quentin', 'Rosalind', 'Silas', 'Thea',
  'Ulrich', 'Veda', 'Wendell', 'Xiomara', 'Yusuf', 'Zelda', 'Anouk', 'Bram', 'Celeste', 'Dmitri',
  'Esme', 'Florian', 'Greer', 'Hollis', 'Ilse', 'Jasper', 'Kiri', 'Lazlo', 'Maren', 'Nico',
];
const lastNames = [
  'Ashdown', 'Brightwater', 'Coldridge', 'Dunmore', 'Eastlake', 'Fairweather', 'Greyhollow', 'Hartigan',
  'Inglefield', 'Jessop', 'Kettleby', 'Lindqvist', 'Marchetti', 'Northcott', 'Oyelaran', 'Penhallow',
  'Quarrington', 'Rowntree', 'Salgado', 'Thistlewood', 'Underhill', 'Vasquez-Moor', 'Whitcombe', 'Yarborough',
];

export function demoPeople(): { email: string; first_name: string; last_name: string; role: Role }[] {
  const people = [...demoAccounts];
  const extraRoles: Role[] = ['instructor', 'instructor', 'admin'];
  for (let i = 0; i < firstNames.length; i++) {
    const first = firstNames[i]!;
    const last = lastNames[(i * 7 + 3) % lastNames.length]!;
    people.push({
      email: `${first}.${last}`.toLowerCase().replace(/[^a-z.]/g, '') + '@example.org',
      first_name: first,
      last_name: last,
      role: extraRoles[i] ?? 'member',
    });
  }
  return people;
}

export async function seed(knex: Knex): Promise<void> {
  const people = demoPeople();
  for (const person of people) {
    await createMember(knex, { ...person, password: DEMO_PASSWORD });
  }
  // Two demo members have left the shop.
  await knex('members').whereIn('email', [people.at(-1)!.email, people.at(-2)!.email]).update({ active: false });
}
