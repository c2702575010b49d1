import { daysUntilExpiry } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import type { Mail } from '../../lib/mailer';
import { shopRepository } from '../shop/shop.repository';
import { signOffsRepository, type ReminderKind, type SignOffRecord } from './sign-offs.repository';

export interface SentReminder {
  signOffId: string;
  kind: ReminderKind;
}

function reminderMail(row: SignOffRecord, now: Date, shop: { name: string; timeZone: string }, appUrl: string): Mail {
  const expiresAt = row.expiresAt as Date;
  const days = daysUntilExpiry(expiresAt, now, shop.timeZone);
  // expires_at is the first instant it no longer counts; the day before it is the last good one.
  const lastGoodDay = new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeZone: shop.timeZone }).format(new Date(expiresAt.getTime() - 1));
  const machines = row.machines.map((m) => m.name);
  const dayWord = days === 1 ? 'day' : 'days';
  return {
    to: row.memberEmail,
    subject: `Your ${row.trainingName} sign-off lapses in ${days} ${dayWord}`,
    text: [
      `Hello ${row.memberFirstName},`,
      '',
      `Your sign-off for ${row.trainingName} at ${shop.name} is good through ${lastGoodDay}.`,
      machines.length
        ? `After that day the stations will not clear you for: ${machines.join(', ')}.`
        : 'After that day it no longer counts.',
      '',
      'To renew it, ask an instructor for a practical check before then.',
      '',
      `Your sign-offs: ${appUrl}/`,
      '',
      shop.name,
    ].join('\n'),
  };
}

/**
 * E-mails members 30 days and 7 days before a sign-off lapses, once each. Safe to run from many
 * processes and as often as wanted: each mail is claimed in the database before it is sent.
 */
export function signOffRemindersService({ config, db, logger, mailer }: Deps) {
  return {
    async sendDue(now: Date): Promise<SentReminder[]> {
      const shop = await shopRepository(db).get();
      const due = await signOffsRepository(db).dueReminders(now);
      const sent: SentReminder[] = [];
      for (const row of due) {
        try {
          // The claim and the hand-off to SMTP share a transaction: a failed send rolls the claim
          // back for the next run, and a second process waits on the row lock, then finds it taken.
          const claimed = await db.transaction(async (trx) => {
            if (!(await signOffsRepository(trx).claimReminder(row.id, row.kind, now))) return false;
            await mailer.send(reminderMail(row, now, shop, config.publicUrl));
            return true;
          });
          if (claimed) sent.push({ signOffId: row.id, kind: row.kind });
        } catch (error) {
          logger.error({ err: error, signOffId: row.id, kind: row.kind }, 'sign-off reminder not sent; the next run tries again');
        }
      }
      if (sent.length) logger.info({ count: sent.length }, 'sign-off reminders sent');
      return sent;
    },
  };
}
