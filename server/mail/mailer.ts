import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
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
