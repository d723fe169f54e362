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

/** Sent to the NEW address when a maker changes theirs: the change happens only when this link is opened. */
export function emailChangeMail(to: string, name: string, url: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your new e-mail address for Canwright',
    text: [
      `Hello ${name},`,
      '',
      'You asked to use this address for your Canwright account. Open this link to confirm it:',
      '',
      url,
      '',
      'Until you do, the account keeps its old address. The link works for one hour. If you did not ask for this, ignore this message.',
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

/**
 * Sent when someone signs up with an address that already has an account: the sign-up page
 * answers as for a new address (so it does not tell who has an account), and the owner learns of
 * it here, with the way back in.
 */
export function alreadySignedUpMail(to: string, name: string, signInUrl: string): OutgoingMail {
  return {
    to,
    subject: 'Your Canwright account already exists',
    text: [
      `Hello ${name},`,
      '',
      'Someone (hopefully you) tried to create a Canwright account with this address, which already has one.',
      'Sign in here; if you forgot the password, use "Forgot your password?" on that page:',
      '',
      signInUrl,
      '',
      'If this was not you, ignore this message: nothing about your account has changed.',
    ].join('\n'),
  };
}
