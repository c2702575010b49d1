import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type { ChecklistItem, SignOffLevel } from '@chuckkey/core';
import { createMember } from './index';

export interface TrainingRow {
  id: string;
  name: string;
  description: string;
  checklist: ChecklistItem[];
  validity_months: number;
  active: boolean;
  created_at: Date;
  updated_at: Date;
}

export async function createTraining(
  db: Knex,
  overrides: Partial<Omit<TrainingRow, 'id' | 'created_at' | 'updated_at'>> & { machine_ids?: string[] } = {},
): Promise<TrainingRow> {
  const { machine_ids: machineIds = [], ...fields } = overrides;
  const checklist = fields.checklist ?? [
    { id: 'explains-the-hazards', label: 'Explains the hazards of the machine' },
    { id: 'sets-up-safely', label: 'Sets up the work safely' },
  ];
  const [row] = await db<TrainingRow>('trainings')
    .insert({
      name: fields.name ?? `Training ${randomUUID().slice(0, 8)}`,
      description: fields.description ?? '',
      checklist: JSON.stringify(checklist) as unknown as ChecklistItem[],
      validity_months: fields.validity_months ?? 12,
      active: fields.active ?? true,
    })
    .returning('*');
  if (!row) throw new Error('training insert returned no row');
  if (machineIds.length) {
    await db('machine_trainings').insert(machineIds.map((machineId) => ({ machine_id: machineId, training_id: row.id })));
  }
  return row;
}

export interface SignOffRow {
  id: string;
  member_id: string;
  training_id: string;
  level: SignOffLevel;
  checklist: (ChecklistItem & { seen: boolean })[];
  note: string;
  signed_by: string;
  signed_via: 'web' | 'station';
  signed_at: Date;
  expires_at: Date | null;
  revoked_at: Date | null;
  revoked_by: string | null;
  revoke_reason: string | null;
  reminded_30_at: Date | null;
  reminded_7_at: Date | null;
}

const DAY_MS = 86_400_000;

/**
 * Inserts a sign-off as it stands, for tests and the demo shop. Without a member, training or
 * signer it makes them; without dates it was signed an hour ago and lapses a year later.
 */
export async function createSignOff(
  db: Knex,
  overrides: Partial<Omit<SignOffRow, 'id' | 'checklist'>> & { checklist?: SignOffRow['checklist'] } = {},
): Promise<SignOffRow> {
  const memberId = overrides.member_id ?? (await createMember(db)).id;
  const signedBy = overrides.signed_by ?? (await createMember(db, { role: 'instructor' })).id;
  const training = overrides.training_id
    ? await db<TrainingRow>('trainings').first('*').where({ id: overrides.training_id })
    : await createTraining(db);
  if (!training) throw new Error(`training ${overrides.training_id} does not exist`);
  const signedAt = overrides.signed_at ?? new Date(Date.now() - 3_600_000);
  const expiresAt = overrides.expires_at !== undefined ? overrides.expires_at : new Date(signedAt.getTime() + 365 * DAY_MS);
  const checklist = overrides.checklist ?? training.checklist.map((item) => ({ ...item, seen: true }));
  const revoked = overrides.revoked_at ?? null;
  const [row] = await db<SignOffRow>('sign_offs')
    .insert({
      member_id: memberId,
      training_id: training.id,
      level: overrides.level ?? 'independent',
      checklist: JSON.stringify(checklist) as unknown as SignOffRow['checklist'],
      note: overrides.note ?? '',
      signed_by: signedBy,
      signed_via: overrides.signed_via ?? 'web',
      signed_at: signedAt,
      expires_at: expiresAt,
      revoked_at: revoked,
      revoked_by: revoked ? (overrides.revoked_by ?? signedBy) : null,
      revoke_reason: revoked ? (overrides.revoke_reason ?? 'Revoked in a test') : null,
      reminded_30_at: overrides.reminded_30_at ?? null,
      reminded_7_at: overrides.reminded_7_at ?? null,
    })
    .returning('*');
  if (!row) throw new Error('sign-off insert returned no row');
  return row;
}
