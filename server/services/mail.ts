import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config';
import type { Database } from '../db/database';
import type { Logger } from '../logger';
import { startFakeSmtp, type FakeSmtp } from './fakeSmtp';

export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Extra headers, such as List-Unsubscribe on notification mail. */
  headers?: Record<string, string>;
};

export type Mailer = {
  /** Sends and resolves once the SMTP server accepted the message. */
  send(mail: OutgoingMail): Promise<void>;
  /** Sends without making the caller wait; failures are logged, never thrown at a request. */
  sendInBackground(mail: OutgoingMail): void;
  /** Resolves when every background send started so far has finished (tests use it). */
  idle(): Promise<void>;
  close(): Promise<void>;
};

/**
 * nodemailer over SMTP: to SMTP_URL when set, otherwise to a local fake SMTP server started on
 * first use (development and tests), which files messages into the development mailbox.
 */
export function createMailer(config: Pick<Config, 'mail'>, db: Database, logger: Logger): Mailer {
  let fake: Promise<FakeSmtp> | null = null;
  let transport: Promise<Transporter> | null = null;
  const pending = new Set<Promise<void>>();

  function getTransport(): Promise<Transporter> {
    if (!transport) {
      transport = config.mail.smtpUrl
        ? Promise.resolve(nodemailer.createTransport(config.mail.smtpUrl))
        : (fake = startFakeSmtp(db, logger, config.mail.fakeSmtpPort)).then((f) =>
            nodemailer.createTransport({ host: '127.0.0.1', port: f.port, secure: false, ignoreTLS: true }),
          );
    }
    return transport;
  }

  async function send(mail: OutgoingMail): Promise<void> {
    const t = await getTransport();
    await t.sendMail({ from: config.mail.from, ...mail });
  }

  return {
    send,
    sendInBackground(mail) {
      const p = send(mail)
        .catch((err: unknown) => logger.error({ err, subject: mail.subject }, 'mail could not be sent'))
        .finally(() => pending.delete(p));
      pending.add(p);
    },
    async idle() {
      await Promise.allSettled([...pending]);
    },
    async close() {
      await Promise.allSettled([...pending]);
      if (transport) (await transport).close();
      if (fake) await (await fake).close();
    },
  };
}
