import { describe, expect, it } from 'vitest';
import { badgeCodeBox, badgeCodeHash } from './badge-codes';
import { ownDatabase } from './test-database';

const BADGE_SECRET = 'demo-badge-secret-used-by-the-seed-tests';

const withSecret = ownDatabase('badges_with_secret', { seed: true, env: { BADGE_SECRET } });
const withoutSecret = ownDatabase('badges_without_secret', { seed: true, env: { BADGE_SECRET: undefined } });

describe('the demo shop waiver', () => {
  it('is version 1, the shop’s own text on machine and welding risks, PPE, rules and training', async () => {
    const versions = await withSecret.db('waiver_versions').select('version', 'title', 'body');
    expect(versions).toHaveLength(1);
    const [waiver] = versions;
    expect(waiver.version).toBe(1);
    expect(waiver.title).toContain('Quillmere');
    for (const topic of ['lathe', 'weld', 'safety glasses', 'instructor', 'shop rules', 'does not replace training']) {
      expect(waiver.body.toLowerCase()).toContain(topic);
    }
  });

  it('was accepted online by most active members; two have not, one is on file as a scanned paper copy', async () => {
    const active = await withSecret.db('members').where({ active: true }).pluck('id');
    const records = await withSecret.db('waiver_records').select('member_id', 'method', 'typed_name', 'scan_type').where({ version: 1 });
    const recorded = new Set(records.map((r) => r.member_id));

    expect(active.filter((id: string) => !recorded.has(id))).toHaveLength(2);
    expect(records.filter((r) => r.method === 'uploaded_scan')).toEqual([
      expect.objectContaining({ method: 'uploaded_scan', typed_name: null, scan_type: 'application/pdf' }),
    ]);
    expect(records.filter((r) => r.method === 'accepted_online').length).toBe(active.length - 3);
  });

  it('leaves the three demo accounts with the waiver on file', async () => {
    const onFile = await withSecret.db('members')
      .join('waiver_records', 'waiver_records.member_id', 'members.id')
      .whereIn('members.email', ['admin@example.org', 'instructor@example.org', 'member@example.org'])
      .pluck('members.email');
    expect(onFile.sort()).toEqual(['admin@example.org', 'instructor@example.org', 'member@example.org']);
  });

  it('stores the paper copy as a PDF that begins with the PDF header (ISO 32000-1, 7.5.2)', async () => {
    const row = await withSecret.db('waiver_records').first('scan').where({ method: 'uploaded_scan' });
    const text = Buffer.from(row.scan).toString('latin1');
    expect(text.startsWith('%PDF-1.4\n')).toBe(true);
    expect(text.trimEnd().endsWith('%%EOF')).toBe(true);
  });
});

describe('the demo badges', () => {
  it('with BADGE_SECRET set, one active badge per active member, each code readable with the secret and matching its hash', async () => {
    const active = await withSecret.db('members').where({ active: true }).pluck('id');
    const badges = await withSecret.db('badges').select('member_id', 'code_hash', 'code_encrypted').whereNull('revoked_at');

    expect(badges.map((b) => b.member_id).sort()).toEqual([...active].sort());
    const box = badgeCodeBox(BADGE_SECRET);
    for (const badge of badges) {
      const code = box.open(badge.code_encrypted);
      expect(code).toMatch(/^[A-Za-z0-9_-]{22}$/);
      expect(badge.code_hash).toBe(badgeCodeHash(code));
    }
  });

  it('without BADGE_SECRET, none: the server issues each badge on first view', async () => {
    const [row] = await withoutSecret.db('badges').count({ count: '*' });
    expect(Number(row?.count)).toBe(0);
    const [records] = await withoutSecret.db('waiver_records').count({ count: '*' });
    expect(Number(records?.count)).toBeGreaterThan(30);
  });
});
