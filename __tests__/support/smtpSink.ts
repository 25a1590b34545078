import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** `headers`: each header's raw value as sent, unfolded, by lower-case name. */
export type ReceivedMail = { to: string; subject: string; text: string; headers: Record<string, string>; raw: string };

export type SmtpSink = {
  /** smtp://127.0.0.1:<port>, for SMTP_URL (config.mail.smtpUrl). */
  url: string;
  received: ReceivedMail[];
  /** Every DATA command, accepted or refused. */
  attempts: number;
  /** Refuses the next `n` messages with a temporary failure (451), as a struggling server does. */
  refuseNext(n: number): void;
  /** Waits `ms` before answering each message (a slow server). */
  answerAfter(ms: number): void;
  close(): Promise<void>;
};

/**
 * A real SMTP server on loopback for tests that need what the development mailbox does not keep
 * (headers, the raw message) or a server that fails on purpose.
 */
export async function startSmtpSink(): Promise<SmtpSink> {
  let refuse = 0;
  let delayMs = 0;
  const sink = { received: [] as ReceivedMail[], attempts: 0 };
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      sink.attempts += 1;
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        setTimeout(() => {
          if (refuse > 0) {
            refuse -= 1;
            const err = Object.assign(new Error('Mailbox busy, try again later'), { responseCode: 451 });
            callback(err);
            return;
          }
          const raw = Buffer.concat(chunks).toString('utf8');
          simpleParser(raw)
            .then((mail) => {
              const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : (mail.to?.text ?? '');
              const headers = Object.fromEntries(
                mail.headerLines.map((h) => [h.key, h.line.slice(h.line.indexOf(':') + 1).replace(/\r?\n[ \t]+/g, ' ').trim()]),
              );
              sink.received.push({ to, subject: mail.subject ?? '', text: mail.text ?? '', headers, raw });
              callback();
            })
            .catch((err: Error) => callback(err));
        }, delayMs);
      });
    },
  });
  const port = await new Promise<number>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve((server.server.address() as AddressInfo).port));
  });
  return Object.assign(sink, {
    url: `smtp://127.0.0.1:${port}`,
    refuseNext(n: number) {
      refuse = n;
    },
    answerAfter(ms: number) {
      delayMs = ms;
    },
    close: () => new Promise<void>((done) => server.close(() => done())),
  });
}
