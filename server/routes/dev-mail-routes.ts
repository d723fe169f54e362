import { Router } from 'express';
import type { MailCapture } from '../mail/mail-capture.ts';

/** Development only: the mail the local capture server kept, newest first. */
export function devMailRoutes(capture: MailCapture): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    // Attachments are named with their size; their bytes stay in the capture.
    const messages = capture.list().map(({ attachments, ...mail }) => ({ ...mail, attachments: attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, bytes: a.content.length })) }));
    res.set('Cache-Control', 'no-store').json({ messages });
  });
  return router;
}
