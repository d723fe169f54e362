import type { OutgoingMail } from './mailer.ts';

/** The account mail Canwright sends. Plain text: it reads the same in every mail program. */

export function verificationMail(to: string, name: string, url: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your e-mail address for Canwright',
    text: [
      `Hello ${name},`,
      '',
      'Open this link to confirm your e-mail address and finish setting up your Canwright account:',
      '',
      url,
      '',
      'The link works for one hour. If you did not sign up for Canwright, ignore this message.',
    ].join('\n'),
  };
}

export function passwordResetMail(to: string, name: string, url: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Canwright password',
    text: [
      `Hello ${name},`,
      '',
      'Someone (hopefully you) asked to reset the password of your Canwright account.',
      'Open this link to choose a new one:',
      '',
      url,
      '',
      'The link works for one hour. If you did not ask for this, ignore this message: your password stays as it is.',
    ].join('\n'),
  };
}
