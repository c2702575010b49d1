import type { Knex } from 'knex';
import { badgeCodeBox, badgeCodeHash, generateBadgeCode } from '../src/badge-codes';

export interface BadgeRow {
  id: string;
  member_id: string;
  code_hash: string;
  code_encrypted: string;
  issued_at: Date;
  issued_by: string | null;
  revoked_at: Date | null;
}

export interface CreatedBadge extends BadgeRow {
  /** The code the card's QR carries; the database holds only its hash and an encrypted copy. */
  code: string;
}

/** Issues a badge to a member, revoking the one they had, as a reissue does. */
export async function createBadge(
  db: Knex,
  fields: { memberId: string; badgeSecret: string; issuedBy?: string | null; code?: string },
): Promise<CreatedBadge> {
  const code = fields.code ?? generateBadgeCode();
  const row = await db.transaction(async (trx) => {
    await trx('badges').where({ member_id: fields.memberId }).whereNull('revoked_at').update({ revoked_at: trx.fn.now() });
    const [inserted] = await trx<BadgeRow>('badges')
      .insert({
        member_id: fields.memberId,
        code_hash: badgeCodeHash(code),
        code_encrypted: badgeCodeBox(fields.badgeSecret).seal(code),
        issued_by: fields.issuedBy ?? null,
      })
      .returning('*');
    return inserted;
  });
  if (!row) throw new Error('badge insert returned no row');
  return { ...row, code };
}

export interface WaiverVersionRow {
  version: number;
  title: string;
  body: string;
  published_at: Date;
  published_by: string | null;
}

/** Publishes a waiver version, by default the one after the newest. */
export async function createWaiverVersion(
  db: Knex,
  fields: Partial<Pick<WaiverVersionRow, 'version' | 'title' | 'body' | 'published_by'>> = {},
): Promise<WaiverVersionRow> {
  const version =
    fields.version ?? Number((await db('waiver_versions').max<{ max: number | null }>({ max: 'version' }).first())?.max ?? 0) + 1;
  const [row] = await db<WaiverVersionRow>('waiver_versions')
    .insert({
      version,
      title: fields.title ?? `Shop safety waiver, version ${version}`,
      body: fields.body ?? 'I understand that machine and welding work can injure me and I will follow the shop rules.',
      published_by: fields.published_by ?? null,
    })
    .returning('*');
  if (!row) throw new Error('waiver version insert returned no row');
  return row;
}

export interface WaiverRecordRow {
  id: string;
  member_id: string;
  version: number;
  method: 'accepted_online' | 'uploaded_scan';
  typed_name: string | null;
  recorded_at: Date;
  recorded_by: string;
  scan: Buffer | null;
  scan_type: string | null;
}

/**
 * Records that a member accepted a waiver version online (the default, typing `typedName`) or
 * that an admin filed their signed paper copy (`scan` with its type).
 */
export async function recordWaiver(
  db: Knex,
  fields: {
    memberId: string;
    version: number;
    typedName?: string;
    recordedBy?: string;
    recordedAt?: Date;
    scan?: { data: Buffer; type: string };
  },
): Promise<WaiverRecordRow> {
  const [row] = await db<WaiverRecordRow>('waiver_records')
    .insert({
      member_id: fields.memberId,
      version: fields.version,
      method: fields.scan ? 'uploaded_scan' : 'accepted_online',
      typed_name: fields.scan ? null : (fields.typedName ?? 'Test Member'),
      recorded_by: fields.recordedBy ?? fields.memberId,
      scan: fields.scan?.data ?? null,
      scan_type: fields.scan?.type ?? null,
      ...(fields.recordedAt ? { recorded_at: fields.recordedAt } : {}),
    })
    .returning('*');
  if (!row) throw new Error('waiver record insert returned no row');
  return row;
}
