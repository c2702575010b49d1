import { describe, expect, it } from 'vitest';
import { checklistSchema, signOffState, trainingInputSchema } from '@chuckkey/core';
import { ownDatabase } from './test-database';

const own = ownDatabase('trainings', { seed: true });

interface SignOffRow {
  member_id: string;
  email: string;
  active: boolean;
  training: string;
  level: string;
  signed_at: Date;
  expires_at: Date | null;
  revoked_at: Date | null;
  revoke_reason: string | null;
  signer_role: string;
}

async function signOffs(): Promise<SignOffRow[]> {
  return own.db('sign_offs as s')
    .join('members as m', 'm.id', 's.member_id')
    .join('members as by', 'by.id', 's.signed_by')
    .join('trainings as t', 't.id', 's.training_id')
    .select('s.member_id', 'm.email', 'm.active', 't.name as training', 's.level', 's.signed_at', 's.expires_at', 's.revoked_at', 's.revoke_reason', 'by.role as signer_role');
}

describe('the demo shop’s trainings', () => {
  it('are the metal shop’s usual courses, each with 3 to 6 practical items that the web form would accept', async () => {
    const trainings = await own.db('trainings').select('name', 'description', 'checklist', 'validity_months as validityMonths').orderBy('name');

    expect(trainings.map((t) => t.name)).toEqual(
      expect.arrayContaining(['General shop safety', 'Metal lathe fundamentals', 'Milling fundamentals', 'MIG welding', 'TIG welding', 'Band saw', 'Surface grinder']),
    );
    for (const training of trainings) {
      expect(trainingInputSchema.safeParse(training).success, training.name).toBe(true);
      expect(training.checklist.length, training.name).toBeGreaterThanOrEqual(3);
      expect(training.checklist.length, training.name).toBeLessThanOrEqual(6);
    }
    const validity = Object.fromEntries(trainings.map((t) => [t.name, t.validityMonths]));
    expect(validity).toMatchObject({ 'General shop safety': 12, 'Metal lathe fundamentals': 24, 'MIG welding': 12, 'Band saw': 0 });
  });

  it('are required by every machine: general shop safety plus the machine’s own', async () => {
    const rows = await own.db('machines as m')
      .leftJoin('machine_trainings as mt', 'mt.machine_id', 'm.id')
      .leftJoin('trainings as t', 't.id', 'mt.training_id')
      .select('m.name as machine', 't.name as training');
    const byMachine = new Map<string, string[]>();
    for (const row of rows) byMachine.set(row.machine, [...(byMachine.get(row.machine) ?? []), row.training]);

    expect(byMachine.size).toBe(12);
    for (const [machine, trainings] of byMachine) {
      expect(trainings, machine).toContain('General shop safety');
      expect(trainings.length, machine).toBe(2);
    }
    expect(byMachine.get('Lathe 1 · 13×40')).toContain('Metal lathe fundamentals');
    expect(byMachine.get('TIG welder')).toContain('TIG welding');
  });
});

describe('the demo machines’ safety checklists', () => {
  it('give every machine the usual cautions, ending with the shop’s own rules', async () => {
    const machines = await own.db('machines').select('name', 'category', 'safety_checklist');

    for (const machine of machines) {
      expect(checklistSchema.safeParse(machine.safety_checklist).success, machine.name).toBe(true);
      const labels: string[] = machine.safety_checklist.map((item: { label: string }) => item.label);
      expect(labels.at(-1), machine.name).toMatch(/shop's posted rules/);
      if (machine.category === 'lathe') {
        // Common practice, no published source: the cautions product.md names for rotating work.
        expect(labels.join(' | ')).toMatch(/Safety glasses/);
        expect(labels.join(' | ')).toMatch(/No gloves, loose sleeves or jewellery/);
        expect(labels.join(' | ')).toMatch(/Chuck key removed/);
        expect(labels.join(' | ')).toMatch(/hair tied back/);
      }
      if (machine.category === 'mig_welder' || machine.category === 'tig_welder') {
        // Common practice, no published source: helmet, gloves, ventilation and a fire watch.
        expect(labels.join(' | ')).toMatch(/helmet/);
        expect(labels.join(' | ')).toMatch(/gloves/);
        expect(labels.join(' | ')).toMatch(/Fume extraction/);
        expect(labels.join(' | ')).toMatch(/fire watch/);
      }
    }
  });
});

describe('the demo shop’s sign-offs', () => {
  it('spread across states and levels: valid, expiring, expired, one revoked with a reason, some supervised', async () => {
    const now = new Date();
    const rows = await signOffs();
    const states = rows.map((r) => signOffState({ expiresAt: r.expires_at, revokedAt: r.revoked_at }, now));

    expect(states.filter((s) => s === 'valid').length).toBeGreaterThan(40);
    expect(states.filter((s) => s === 'expiring').length).toBeGreaterThanOrEqual(5);
    expect(states.filter((s) => s === 'expired').length).toBeGreaterThanOrEqual(5);
    const revoked = rows.filter((r) => r.revoked_at);
    expect(revoked).toHaveLength(1);
    expect(revoked[0]!.revoke_reason!.length).toBeGreaterThan(10);
    expect(rows.filter((r) => r.level === 'supervised').length).toBeGreaterThanOrEqual(5);
  });

  it('were all given in the past by instructors or admins', async () => {
    const rows = await signOffs();

    for (const row of rows) {
      expect(row.signed_at.getTime()).toBeLessThan(Date.now());
      expect(['instructor', 'admin']).toContain(row.signer_role);
    }
  });

  it('give most active members general shop safety and fewer of them the lathe or MIG welding', async () => {
    const rows = await signOffs();
    const active = await own.db('members').where({ active: true }).count({ count: '*' });
    const holders = (training: string) => new Set(rows.filter((r) => r.training === training && r.active).map((r) => r.member_id)).size;
    const activeCount = Number(active[0]!.count);

    expect(holders('General shop safety')).toBeGreaterThan(activeCount * 0.8);
    expect(holders('Metal lathe fundamentals')).toBeLessThan(holders('General shop safety'));
    expect(holders('MIG welding')).toBeGreaterThan(3);
  });

  it('give the demo member valid sign-offs, one of them lapsing within 30 days', async () => {
    const now = new Date();
    const rows = (await signOffs()).filter((r) => r.email === 'member@example.org');
    const states = rows.map((r) => signOffState({ expiresAt: r.expires_at, revokedAt: r.revoked_at }, now));

    expect(states.filter((s) => s === 'valid').length).toBeGreaterThanOrEqual(2);
    expect(states).toContain('expiring');
    expect(rows.map((r) => r.training)).toContain('General shop safety');
  });

  it('are each in the audit log, with the revocation too', async () => {
    const [created] = await own.db('audit_log').where({ action: 'sign_off.created' }).count({ count: '*' });
    const [revoked] = await own.db('audit_log').where({ action: 'sign_off.revoked' }).count({ count: '*' });
    const [total] = await own.db('sign_offs').count({ count: '*' });

    expect(Number(created!.count)).toBe(Number(total!.count));
    expect(Number(revoked!.count)).toBe(1);
  });
});
