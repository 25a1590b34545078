import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../db/database';
import type { Logger } from '../logger';

export type FakeSmtp = { port: number; close(): Promise<void> };

function addresses(field: AddressObject | AddressObject[] | undefined): string {
  if (!field) return '';
  return (Array.isArray(field) ? field : [field]).map((a) => a.text).join(', ');
}

/**
 * A real SMTP server on loopback that keeps what it receives in the mailbox table, so development
 * and tests send mail over SMTP exactly as production does and a person can read it at /dev/mailbox.
 */
export function startFakeSmtp(db: Database, logger: Logger, port = 0): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Tunefork development mailbox',
    size: 5 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) =>
          db.models.MailboxMessage.create({
            toAddress: addresses(mail.to),
            fromAddress: addresses(mail.from),
            subject: mail.subject ?? '',
            textBody: mail.text ?? '',
            htmlBody: typeof mail.html === 'string' ? mail.html : '',
          }),
        )
        .then(() => callback())
        .catch((err: Error) => {
          logger.error({ err }, 'fake SMTP could not store a message');
          callback(err);
        });
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const { port: bound } = server.server.address() as AddressInfo;
      resolve({ port: bound, close: () => new Promise<void>((done) => server.close(() => done())) });
    });
  });
}
