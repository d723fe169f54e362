import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** Sends through any SMTP server: a real one in production, the local capture otherwise. */
export function createMailer(smtpUrl: string, from: string): Mailer {
  const local = new URL(smtpUrl).hostname === '127.0.0.1';
  const transport = nodemailer.createTransport(local ? { host: '127.0.0.1', port: Number(new URL(smtpUrl).port), secure: false, ignoreTLS: true } : smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close: () => transport.close(),
  };
}

/**
 * No SMTP server and no local mailbox: each mail is logged as not sent, with its address and
 * subject only, never its text (which holds sign-in and reset links).
 */
export function createNotSentMailer(log: (line: string) => void = (line) => console.warn(line)): Mailer {
  return {
    async send(mail) {
      log(`Mail not sent (no SMTP_URL set, and no local mailbox on this address): "${mail.subject}" to ${mail.to}`);
    },
    close: () => {},
  };
}
