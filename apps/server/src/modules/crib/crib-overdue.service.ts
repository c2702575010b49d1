import type { CribOverdue } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import type { Mail } from '../../lib/mailer';
import { shopPoliciesRepository } from '../shop/shop-policies.repository';
import { shopRepository } from '../shop/shop.repository';
import { cribOverdueRepository, OVERDUE_NOTICES_MAX, type OverdueCheckoutRecord } from './crib-overdue.repository';

const HOUR_MS = 3_600_000;

interface ShopForMail {
  name: string;
  timeZone: string;
  blockDays: number | null;
}

function dueText(dueAt: Date, timeZone: string): string {
  const day = new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeZone }).format(dueAt);
  const time = new Intl.DateTimeFormat('en-US', { timeStyle: 'short', timeZone }).format(dueAt);
  return `${day}, ${time}`;
}

/** The reminder in plain words: the item, when it was due, where it goes back, and the shop. */
export function overdueNoticeMail(row: OverdueCheckoutRecord, shop: ShopForMail, appUrl: string): Mail {
  const due = dueText(row.dueAt, shop.timeZone);
  const where = row.binLocation ? `the tool crib at ${shop.name} (its place there: ${row.binLocation})` : `the tool crib at ${shop.name}`;
  const last = row.noticesSent >= OVERDUE_NOTICES_MAX;
  return {
    to: row.memberEmail,
    subject: `Overdue: ${row.itemName} (${row.assetTag}), due back ${due}`,
    text: [
      `Hello ${row.memberFirstName},`,
      '',
      `The ${row.itemName} (asset tag ${row.assetTag}) you borrowed was due back on ${due} (${shop.timeZone} time).`,
      `Please return it to ${where}, so that other members can use it.`,
      ...(shop.blockDays === null
        ? []
        : [
            shop.blockDays === 0
              ? 'While it is overdue, the machine stations will not let you start a session.'
              : `Once it is more than ${shop.blockDays} ${shop.blockDays === 1 ? 'day' : 'days'} overdue, the machine stations will not let you start a session until it is back.`,
          ]),
      '',
      last ? 'This is the last reminder we send about it.' : `This is reminder ${row.noticesSent} of ${OVERDUE_NOTICES_MAX}.`,
      '',
      `What you have out: ${appUrl}/`,
      '',
      shop.name,
    ].join('\n'),
  };
}

export const toCribOverdue = (row: OverdueCheckoutRecord, now: Date): CribOverdue => ({
  checkoutId: row.checkoutId,
  itemId: row.itemId,
  itemName: row.itemName,
  assetTag: row.assetTag,
  memberId: row.memberId,
  memberName: `${row.memberFirstName} ${row.memberLastName}`,
  memberEmail: row.memberEmail,
  dueAt: row.dueAt.toISOString(),
  // Tenths of an hour, rounded down: "overdue by 0.5 h" is still useful on the day it falls due.
  overdueByHours: Math.floor((now.getTime() - row.dueAt.getTime()) / (HOUR_MS / 10)) / 10,
  noticesSent: row.noticesSent,
  lastNoticeAt: row.lastNoticeAt ? row.lastNoticeAt.toISOString() : null,
});

/** Tools kept past their due time: the admins' list and the reminders the job mails, with the time passed in. */
export function cribOverdueService({ config, db, logger, mailer }: Deps) {
  return {
    async overdue(now: Date): Promise<CribOverdue[]> {
      return (await cribOverdueRepository(db).overdue(now)).map((row) => toCribOverdue(row, now));
    },

    /**
     * Mails each member whose tool is owed a reminder: when it becomes overdue, then once a day,
     * three in all. Each claim and its hand-off to SMTP share a transaction, so a failed send
     * rolls the claim back for the next run, and a concurrent run finds the row already taken.
     */
    async sendOverdueNotices(now: Date): Promise<string[]> {
      const due = await cribOverdueRepository(db).owedNotices(now);
      if (due.length === 0) return [];
      const [{ name, timeZone }, { overdueCheckoutBlockDays }] = await Promise.all([shopRepository(db).get(), shopPoliciesRepository(db).get()]);
      const shop = { name, timeZone, blockDays: overdueCheckoutBlockDays };
      const sent: string[] = [];
      for (const id of due) {
        try {
          const claimed = await db.transaction(async (trx) => {
            const row = await cribOverdueRepository(trx).claimNotice(id, now);
            if (!row) return false;
            await mailer.send(overdueNoticeMail(row, shop, config.publicUrl));
            return true;
          });
          if (claimed) sent.push(id);
        } catch (error) {
          logger.error({ err: error, checkoutId: id }, 'overdue reminder not sent; the next run tries again');
        }
      }
      if (sent.length) logger.info({ checkouts: sent }, 'overdue crib reminders sent');
      return sent;
    },
  };
}
