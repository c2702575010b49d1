import type { Knex } from 'knex';
import { fullName } from '@chuckkey/core';
import { createBadge, createWaiverVersion, recordWaiver } from '../factories';
import { demoAccounts } from './02_people';

export const demoWaiverTitle = 'Quillmere Forge & Lathe Collective — shop safety waiver';

/** The demo shop's own waiver, in plain words. A real shop's waiver is a matter for its own counsel. */
export const demoWaiverBody = `Quillmere Forge & Lathe Collective is a shared metal shop run by its members and volunteers. Please read this before you work here.

1. The work is dangerous. Lathes, mills, drills, saws and grinders turn with enough force to catch hair, sleeves, gloves and jewellery and to throw chips or broken tools. Welding and cutting produce ultraviolet light that burns eyes and skin, fumes and gases, spatter, hot metal and sparks that can start fires. Sharp edges, heavy stock and hot parts can hurt you long after the machine stops.

2. I will wear the protection the job calls for: safety glasses on the shop floor at all times, a welding helmet with the right shade, welding gloves and flame-resistant clothing in the welding bay, hearing protection near loud work and closed shoes. At rotating machines I will not wear gloves, loose sleeves or jewellery, and I will tie back long hair.

3. I will use a machine only after an instructor has signed me off on it, and only at the level I was signed off for. If I am signed off for supervised use, I will work only while a supervisor is on duty.

4. I will follow the instructors, the supervisor on duty and the shop rules posted in the shop and at each machine. I will take the chuck key out of the chuck at once, stop a machine before I measure or clear chips, keep a fire watch when I weld or cut, and keep the ventilation running.

5. I will not use a machine that is tagged out, and I will tag out and report a machine that is damaged or unsafe. I will report every injury, near miss and damage to the supervisor on duty the same day.

6. This waiver does not replace training. Signing it does not mean I know how to use any machine; the shop's in-person training, its rules and the law where the shop is come first.

7. I take part of my own free will and accept the risks described above. The collective may suspend my use of the shop if I put myself or others in danger.`;

/**
 * A minimal one-page PDF standing in for a scanned signed paper waiver, written by hand so the
 * seed needs no PDF library: a header, four objects and a cross-reference table.
 */
export function demoScanPdf(name: string): Buffer {
  const text = `Signed paper waiver, version 1: ${name}`.replace(/[()\\]/g, '');
  const stream = `BT /F1 14 Tf 56 720 Td (${text}) Tj ET`;
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>',
    `<< /Length ${stream.length} >>\nstream\n${stream}\nendstream`,
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
  ];
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((object, index) => {
    offsets.push(Buffer.byteLength(body, 'latin1'));
    body += `${index + 1} 0 obj\n${object}\nendobj\n`;
  });
  const xref = Buffer.byteLength(body, 'latin1');
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const offset of offsets) body += `${String(offset).padStart(10, '0')} 00000 n \n`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, 'latin1');
}

const DAY_MS = 24 * 60 * 60 * 1000;

export async function seed(knex: Knex): Promise<void> {
  const admin = await knex('members').first('id').where({ email: demoAccounts[0]!.email });
  if (!admin) throw new Error('the demo admin is missing: run the people seed first');
  const members: { id: string; email: string; first_name: string; last_name: string; role: string }[] = await knex('members')
    .select('id', 'email', 'first_name', 'last_name', 'role')
    .where({ active: true })
    .orderBy('email');

  const waiver = await createWaiverVersion(knex, { version: 1, title: demoWaiverTitle, body: demoWaiverBody, published_by: admin.id });
  await knex('waiver_versions')
    .where({ version: waiver.version })
    .update({ published_at: new Date(Date.now() - 400 * DAY_MS) });

  // Two plain members have not accepted it yet, so the station has someone to turn away;
  // one more signed the paper copy at the front desk instead. The demo accounts have accepted.
  const demoEmails = new Set(demoAccounts.map((a) => a.email));
  const plain = members.filter((m) => m.role === 'member' && !demoEmails.has(m.email));
  const notAccepted = new Set([plain[3]?.id, plain[11]?.id]);
  const onPaper = plain[7]?.id;

  for (const [index, member] of members.entries()) {
    if (notAccepted.has(member.id)) continue;
    const recordedAt = new Date(Date.now() - (20 + ((index * 37) % 360)) * DAY_MS);
    if (member.id === onPaper) {
      await recordWaiver(knex, {
        memberId: member.id,
        version: waiver.version,
        recordedBy: admin.id,
        recordedAt,
        scan: { data: demoScanPdf(fullName(member.first_name, member.last_name)), type: 'application/pdf' },
      });
    } else {
      await recordWaiver(knex, { memberId: member.id, version: waiver.version, typedName: fullName(member.first_name, member.last_name), recordedAt });
    }
  }

  // Codes are kept encrypted with BADGE_SECRET; without it the server issues each badge on first view.
  const badgeSecret = process.env.BADGE_SECRET;
  if (badgeSecret) {
    for (const member of members) await createBadge(knex, { memberId: member.id, badgeSecret, issuedBy: admin.id });
  }
}
