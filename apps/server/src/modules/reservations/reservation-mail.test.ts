import ICAL from 'ical.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMachine } from '@chuckkey/db/factories';
import { createApp } from '../../app';
import { createLogger } from '../../lib/logger';
import type { Mailer } from '../../lib/mailer';
import { caughtMailWithAttachments, countMail, createTestContext, recordingPublisher, signedIn, type TestContext } from '../../test/harness';
import { slot } from '../../test/slots';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const body = (machineId: string, start: Date, end: Date) => ({ machineId, start: start.toISOString(), end: end.toISOString() });

function vevent(ics: string) {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  const event = calendar.getFirstSubcomponent('vevent');
  if (!event) throw new Error('no VEVENT in the attachment');
  return { calendar, event };
}

describe('reservation mail', () => {
  it('confirms a reservation with reservation.ics as METHOD:REQUEST, and the cancellation carries METHOD:CANCEL with the same UID', async () => {
    const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
    const member = await signedIn(ctx, 'member');
    const start = slot(2, 9);
    const end = slot(2, 11);

    const created = await member.post('/api/reservations', body(machine.id, start, end));
    expect(created.status).toBe(201);
    const id = created.body.id as string;

    const confirmation = await caughtMailWithAttachments(ctx.db, member.member.email);
    expect(confirmation.subject).toContain(machine.name);
    expect(confirmation.attachments).toHaveLength(1);
    const [request] = confirmation.attachments;
    expect(request!.filename).toBe('reservation.ics');
    // RFC 5546 §2.4 / RFC 6047 §2.4: the MIME type names the iTIP method of the object it carries.
    expect(request!.contentType).toMatch(/^text\/calendar;.*method=REQUEST/i);
    // RFC 5545 §3.1: content lines end in CRLF.
    expect(request!.content).toMatch(/\r\n$/);
    expect(request!.content.replace(/\r\n/g, '')).not.toMatch(/\n/);
    const sent = vevent(request!.content);
    // RFC 5545 §3.7.2 and RFC 5546 §3.2.2: a REQUEST names the organizer and its attendee.
    expect(sent.calendar.getFirstPropertyValue('method')).toBe('REQUEST');
    expect(sent.event.getFirstPropertyValue('uid')).toBe(`${id}@chuckkey`);
    expect(sent.event.getFirstPropertyValue('organizer')).toBe(`mailto:${ctx.config.MAIL_FROM.replace(/^.*<|>.*$/g, '')}`);
    expect(sent.event.getFirstPropertyValue('attendee')).toBe(`mailto:${member.member.email}`);
    expect(sent.event.getFirstPropertyValue('status')).toBe('CONFIRMED');
    // RFC 5545 §3.8.7.2: DTSTAMP is present; §3.8.2.4 and §3.8.2.2: the reserved times, in UTC.
    expect(sent.event.getFirstPropertyValue('dtstamp')).not.toBeNull();
    const event = new ICAL.Event(sent.event);
    expect(event.startDate.toJSDate().toISOString()).toBe(start.toISOString());
    expect(event.endDate.toJSDate().toISOString()).toBe(end.toISOString());

    expect((await member.delete(`/api/reservations/${id}`)).status).toBe(204);
    const deadline = Date.now() + 5_000;
    while ((await countMail(ctx.db, member.member.email)) < 2 && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 50));
    const cancellation = await caughtMailWithAttachments(ctx.db, member.member.email);
    expect(cancellation.subject).toMatch(/^Cancelled/);
    const [cancel] = cancellation.attachments;
    expect(cancel!.contentType).toMatch(/method=CANCEL/i);
    const withdrawn = vevent(cancel!.content);
    // RFC 5546 §3.2.5: a CANCEL names the same UID, with STATUS:CANCELLED and a higher SEQUENCE.
    expect(withdrawn.calendar.getFirstPropertyValue('method')).toBe('CANCEL');
    expect(withdrawn.event.getFirstPropertyValue('uid')).toBe(`${id}@chuckkey`);
    expect(withdrawn.event.getFirstPropertyValue('status')).toBe('CANCELLED');
    expect(Number(withdrawn.event.getFirstPropertyValue('sequence'))).toBeGreaterThan(Number(sent.event.getFirstPropertyValue('sequence')));
  });

  it('keeps the reservation and answers 201 when the mail cannot be handed off, and logs the failure', async () => {
    const errors: unknown[] = [];
    const logger = createLogger('silent');
    const failingLogger = Object.assign(Object.create(logger), {
      error: (...args: unknown[]) => {
        errors.push(args);
      },
    }) as typeof logger;
    const brokenMailer: Mailer = {
      async send() {
        throw new Error('SMTP refused');
      },
      close() {},
    };
    const changed: string[] = [];
    const { app, close } = createApp({ config: ctx.config, db: ctx.db, logger: failingLogger, mailer: brokenMailer, live: recordingPublisher(changed) });
    try {
      const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
      const member = await signedIn({ ...ctx, app }, 'member');
      const res = await member.post('/api/reservations', body(machine.id, slot(3, 9), slot(3, 10)));
      expect(res.status).toBe(201);
      expect(await ctx.db('reservations').where({ id: res.body.id, status: 'active' }).count({ n: '*' })).toEqual([{ n: 1 }]);
      expect(errors.length).toBeGreaterThan(0);
      expect(changed).toEqual([machine.id]);

      expect((await member.delete(`/api/reservations/${res.body.id}`)).status).toBe(204);
      expect(changed).toEqual([machine.id, machine.id]);
    } finally {
      await close();
      brokenMailer.close();
    }
  });
});
