import { Router } from 'express';
import type { MailCapture } from '../mail/mail-capture.ts';

/** Development only: the mail the local capture server kept, newest first. */
export function devMailRoutes(capture: MailCapture): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.set('Cache-Control', 'no-store').json({ messages: capture.list() });
  });
  return router;
}
