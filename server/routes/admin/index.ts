import { Router } from 'express';
import { allow } from '../../policies';
import { reviewPolicy } from '../../policies/review';
import { getConfig } from '../../config';
import { notFound } from '../../errors';
import { readCapturedMail } from '../../mail/capture-server';
import type { OutboxMessage } from '@shared/review/types';
import { atLeast } from '../../policies';
import { reindexState, startReindex } from '../../services/reindex-job';

/** Admin tools. The Outbox exists only where a capture server stores the mail (local use, tests). */
export function adminRouter(): Router {
  const router = Router();

  router.get('/outbox', allow(reviewPolicy.outbox, 'Only admins read the outbox.'), async (_req, res) => {
    const dir = getConfig().MAIL_CAPTURE_DIR;
    if (!dir) throw notFound('The outbox (mail is sent to a real provider here, not captured)');
    const mails = await readCapturedMail(dir);
    const data: OutboxMessage[] = mails.slice(0, 500).map((m) => ({ id: m.id, receivedAt: m.receivedAt, from: m.from, to: m.to, subject: m.subject, text: m.text, html: m.html }));
    res.set('Cache-Control', 'no-store').json({ data, total: mails.length });
  });

  const adminsOnly = allow((actor) => atLeast(actor, 'admin'), 'Only admins rebuild the search index.');
  router.get('/reindex', adminsOnly, (_req, res) => {
    res.set('Cache-Control', 'no-store').json({ data: reindexState() });
  });
  // Rebuilds the index from MariaDB in the background; searches keep answering meanwhile.
  router.post('/reindex', adminsOnly, (_req, res) => {
    res.status(202).json({ data: startReindex() });
  });

  return router;
}
