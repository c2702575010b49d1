import { simpleParser, type AddressObject, type HeaderValue } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Db } from '../../lib/db';
import type { Logger } from '../../lib/logger';
import { outboxRepository } from './outbox.repository';

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

/** The attachment's type with its parameters (`method=REQUEST`), which mailparser keeps apart. */
function fullContentType(type: string, header: HeaderValue | undefined): string {
  const params = header && typeof header === 'object' && 'params' in header ? Object.entries(header.params) : [];
  return [type, ...params.map(([name, value]) => `${name}=${value}`)].join('; ');
}

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

/**
 * A local SMTP server for development and tests: it accepts every message and keeps it in
 * the outbox table, where admins read it on the Outbox page. Nothing leaves the machine.
 */
export async function startMailCatcher({ db, logger, port, host = '127.0.0.1' }: { db: Db; logger: Logger; port: number; host?: string }) {
  const outbox = outboxRepository(db);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    banner: 'Chuckkey development mail catcher',
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
          await outbox.insert({
            messageId: parsed.messageId ?? null,
            from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to: envelopeTo.length ? envelopeTo : addresses(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            attachments: parsed.attachments.filter((a) => a.contentType.startsWith('text/')).map((a) => ({
              filename: a.filename ?? null,
              contentType: fullContentType(a.contentType, a.headers.get('content-type')),
              content: a.content.toString('utf8'),
            })),
          });
          logger.info({ to: envelopeTo, subject: parsed.subject }, 'mail caught');
          callback();
        })
        .catch((err: Error) => {
          logger.error({ err }, 'could not store caught mail');
          callback(err);
        });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  server.on('error', (err) => logger.error({ err }, 'mail catcher error'));
  const address = server.server.address();
  const boundPort = typeof address === 'object' && address ? address.port : port;
  return {
    port: boundPort,
    url: `smtp://${host}:${boundPort}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
