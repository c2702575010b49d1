import nodemailer from 'nodemailer';
import type { Logger } from './logger';

export interface MailAttachment {
  filename: string;
  /** The full MIME type with its parameters, e.g. `text/calendar; method=REQUEST; charset=UTF-8`. */
  contentType: string;
  content: string;
}

export interface Mail {
  to: string;
  subject: string;
  text: string;
  attachments?: MailAttachment[];
}

export interface Mailer {
  send(mail: Mail): Promise<void>;
  close(): void;
}

/** Mail goes out through SMTP: in development and tests to the local catcher, else to SMTP_URL. */
export function createMailer(smtpUrl: string, from: string, logger: Logger): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      const info = await transport.sendMail({ from, ...mail });
      logger.info({ messageId: info.messageId, subject: mail.subject }, 'mail sent');
    },
    close() {
      transport.close();
    },
  };
}
