import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** A message the local capture server received, as the dev mail page shows it. */
export interface CapturedMail {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  /** Files sent with the message (a kit's PDF). */
  attachments: { filename: string; contentType: string; content: Buffer }[];
}

export interface MailCapture {
  /** smtp:// URL of the capture server on loopback, for nodemailer. */
  url: string;
  /** Newest first. */
  list(): CapturedMail[];
  /** Resolves with the first message to `to` received after message id `after` (kept or still to come). */
  waitFor(to: string, options?: { timeoutMs?: number; after?: number }): Promise<CapturedMail>;
  close(): Promise<void>;
}

const keep = 200;

/**
 * A fake SMTP server on loopback that keeps what it receives, so that locally and in tests
 * verification and reset mail can be read (and their links followed) without a real mailbox.
 */
export async function startMailCapture(): Promise<MailCapture> {
  const messages: CapturedMail[] = [];
  const waiters = new Set<{ to: string; after: number; resolve: (mail: CapturedMail) => void }>();
  let nextId = 1;

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    banner: 'Canwright local mail capture',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: CapturedMail = {
            id: nextId++,
            receivedAt: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((rcpt) => rcpt.address.toLowerCase()),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? 'attachment', contentType: a.contentType, content: a.content })),
          };
          messages.unshift(mail);
          messages.length = Math.min(messages.length, keep);
          for (const waiter of waiters) {
            if (mail.id > waiter.after && mail.to.includes(waiter.to)) {
              waiters.delete(waiter);
              waiter.resolve(mail);
            }
          }
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;

  return {
    url: `smtp://127.0.0.1:${port}`,
    list: () => [...messages],
    waitFor(to, { timeoutMs = 10_000, after = 0 } = {}) {
      const address = to.toLowerCase();
      const kept = messages.findLast((mail) => mail.id > after && mail.to.includes(address)); // oldest first
      if (kept) return Promise.resolve(kept);
      return new Promise((resolve, reject) => {
        const waiter = { to: address, after, resolve: (mail: CapturedMail) => (clearTimeout(timer), resolve(mail)) };
        const timer = setTimeout(() => {
          waiters.delete(waiter);
          reject(new Error(`No mail to ${to} within ${timeoutMs} ms`));
        }, timeoutMs);
        waiters.add(waiter);
      });
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
