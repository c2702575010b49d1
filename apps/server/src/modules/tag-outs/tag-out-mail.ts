import type { Deps } from '../../lib/deps';
import type { Mail } from '../../lib/mailer';
import { shopRepository } from '../shop/shop.repository';
import { tagOutsRepository, type TagOutMailRecord } from './tag-outs.repository';

interface ShopForMail {
  name: string;
  timeZone: string;
}

function reportedWhen(at: Date, timeZone: string): string {
  const day = new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeZone }).format(at);
  const time = new Intl.DateTimeFormat('en-US', { timeStyle: 'short', timeZone }).format(at);
  return `${day}, ${time}`;
}

/**
 * The notice to the admins, one message to all of them (each sees who else was told): which
 * machine, why, who reported it and when, and where to clear it.
 */
export function tagOutNoticeMail(to: readonly string[], row: TagOutMailRecord, shop: ShopForMail, appUrl: string): Mail {
  const reporter = row.reporterFirstName ? `${row.reporterFirstName} ${row.reporterLastName ?? ''}`.trim() : 'A former member';
  return {
    to: to.join(', '),
    subject: `Tagged out: ${row.machineName}`,
    text: [
      'Hello,',
      '',
      `${reporter} tagged out the ${row.machineName} on ${reportedWhen(row.reportedAt, shop.timeZone)} (${shop.timeZone} time).`,
      '',
      `Reason: ${row.reason}`,
      '',
      'The stations refuse the machine and the board shows it out of service until the tag-out is cleared.',
      `Look at it and clear it under Upkeep › Tag-outs: ${appUrl}/upkeep/tag-outs`,
      '',
      shop.name,
    ].join('\n'),
  };
}

/**
 * Tells every active admin of a new tag-out, after it committed. A failed hand-off is logged and
 * never undoes the tag-out: the machine must stay out of service whatever the mail does.
 */
export function tagOutMail({ config, db, logger, mailer }: Deps) {
  return {
    async notifyAdmins(tagOutId: string): Promise<void> {
      try {
        const repository = tagOutsRepository(db);
        const [row, admins, shop] = await Promise.all([repository.forMail(tagOutId), repository.adminRecipients(), shopRepository(db).get()]);
        if (!row || admins.length === 0) return;
        await mailer.send(tagOutNoticeMail(admins, row, shop, config.publicUrl));
      } catch (error) {
        logger.error({ err: error, tagOutId }, 'tag-out mail not sent');
      }
    },
  };
}
