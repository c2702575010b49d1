import type { OutboxAttachment, OutboxMessage } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface CaughtMail {
  messageId: string | null;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: CaughtAttachment[];
}

export interface CaughtAttachment {
  filename: string | null;
  contentType: string;
  content: string;
}

/** What the list shows of an attachment; the content itself is fetched one at a time. */
function described(attachment: CaughtAttachment): OutboxAttachment {
  return {
    filename: attachment.filename,
    contentType: attachment.contentType,
    size: Buffer.byteLength(attachment.content, 'utf8'),
  };
}

export function outboxRepository(db: Db) {
  return {
    async insert(mail: CaughtMail): Promise<void> {
      await db('outbox_messages').insert({
        message_id: mail.messageId,
        from_address: mail.from,
        to_addresses: mail.to,
        subject: mail.subject,
        text_body: mail.text,
        html_body: mail.html,
        attachments: JSON.stringify(mail.attachments),
      });
    },

    async list(page: number, pageSize: number): Promise<{ items: OutboxMessage[]; total: number }> {
      const rows = await db('outbox_messages')
        .select({
          id: 'id',
          from: 'from_address',
          to: 'to_addresses',
          subject: 'subject',
          text: 'text_body',
          receivedAt: 'received_at',
          attachments: 'attachments',
          total: db.raw('count(*) over ()'),
        })
        .orderBy([{ column: 'received_at', order: 'desc' }, { column: 'id' }])
        .limit(pageSize)
        .offset((page - 1) * pageSize);
      const total = rows[0]?.total ?? Number((await db('outbox_messages').count({ count: '*' }))[0]?.count ?? 0);
      return {
        items: rows.map(({ total: _total, receivedAt, attachments, ...row }) => ({
          ...row,
          receivedAt: (receivedAt as Date).toISOString(),
          attachments: ((attachments ?? []) as CaughtAttachment[]).map(described),
        })),
        total: Number(total),
      };
    },

    async attachment(id: string, index: number): Promise<CaughtAttachment | undefined> {
      const row = await db('outbox_messages').first({ attachments: 'attachments' }).where({ id });
      return ((row?.attachments ?? []) as CaughtAttachment[])[index];
    },
  };
}
