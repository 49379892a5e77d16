import { Router } from 'express';
import { reviewsRouter } from './index';
import { excerptSubmitRouter } from './excerpt-submit';
import { historyRouter } from '../history';
import { concordanceRouter } from '../concordance';
import { adminRouter } from '../admin';

/**
 * The editorial workflow's routes, mounted in one line by the API router:
 * /reviews, /history, /concordance, /admin (outbox) and POST /excerpts/:id/submit.
 */
export function workflowRouter(): Router {
  const router = Router();
  router.use('/reviews', reviewsRouter());
  router.use('/history', historyRouter());
  router.use('/concordance', concordanceRouter());
  router.use('/admin', adminRouter());
  router.use('/excerpts', excerptSubmitRouter());
  return router;
}
