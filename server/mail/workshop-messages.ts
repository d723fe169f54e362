import type { OutgoingMail } from './mailer.ts';

/** A workshop's time in words, in UTC (the server does not know the reader's zone). */
export const when = (date: Date) => date.toLocaleString('en-GB', { dateStyle: 'full', timeStyle: 'short', timeZone: 'UTC' }) + ' UTC';

/** An invitation to a workshop: one link, for this address only. */
export function workshopInvitationMail(to: string, w: { title: string; instructor: string; startsAt: Date; place: string; link: string; days: number }): OutgoingMail {
  return {
    to,
    subject: `Invitation: ${w.title} (Canwright workshop)`,
    text: [
      'Hello,',
      '',
      `${w.instructor} invites you to the stove-building workshop "${w.title}" on ${when(w.startsAt)}${w.place ? `, at ${w.place}` : ''}.`,
      '',
      'Open this link to join. Without a Canwright account you can make one there with this address; the link works for this address only.',
      '',
      w.link,
      '',
      `The link works for ${w.days} days. In the workshop you get the printable drilling kit, and your instructor sees the burns you log for it.`,
      '',
      'Stoves are lit outdoors only: carbon monoxide from a fire indoors kills. If you did not expect this message, ignore it.',
    ].join('\n'),
  };
}

/** The kit as a PDF, for a member to print at home. */
export function kitMail(to: string, k: { name: string; title: string; instructor: string; link: string; fileName: string; pdf: Buffer }): OutgoingMail {
  return {
    to,
    subject: `Your kit for ${k.title}`,
    text: [
      `Hello ${k.name},`,
      '',
      `${k.instructor} sent you the drilling kit for "${k.title}". Print it at 100 % (no "fit to page"), then check the calibration ruler on the first sheet with a real ruler before you cut anything.`,
      '',
      `The workshop's page: ${k.link}`,
      '',
      'Wear eye protection and clamp the can when drilling; cut edges are sharp. Burn off coatings outdoors and never heat galvanized metal. Never burn indoors or in a tent: carbon monoxide kills. Follow local fire rules and codes.',
    ].join('\n'),
    attachments: [{ filename: k.fileName, content: k.pdf, contentType: 'application/pdf' }],
  };
}
