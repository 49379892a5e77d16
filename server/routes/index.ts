import { Router } from 'express';
import { healthRouter } from './health';
import { authRouter } from './auth';
import { usersRouter } from './users';
import { reckonRouter } from './reckon';
import { searchRouter } from './search';
import { insightsRouter } from './insights';
import { teiRouter } from './open-standards/tei';
import { sourcesRouter } from './sources';
import { facsimilesRouter, sourceFacsimilesRouter } from './sources/facsimiles';
import { excerptsRouter, sourceExcerptsRouter } from './excerpts';
import { sizesRouter } from './sizes';
import { citeRouter } from './cite';
import { programmesRouter, sharedProgrammesRouter } from './programmes';
import { importRouter } from './import';
import { workflowRouter } from './reviews/workflow';
import { apiNotFound } from '../http/error-handler';
import { buildOpenApi } from '../services/openapi';

/**
 * The API under /api. Each resource has its own folder with a router factory;
 * mount it here. The authorization-matrix test reads this router's routes.
 */
export function apiRouter(): Router {
  const router = Router();
  router.use('/health', healthRouter());
  router.use('/auth', authRouter());
  router.use('/users', usersRouter());
  router.use('/reckon', reckonRouter());
  router.use('/search', searchRouter());
  router.use('/insights', insightsRouter());
  router.use('/sources', teiRouter());
  router.use('/sources', sourcesRouter());
  router.use('/sources', sourceExcerptsRouter());
  router.use('/sources', sourceFacsimilesRouter());
  router.use('/excerpts', excerptsRouter());
  router.use('/facsimiles', facsimilesRouter());
  router.use('/sizes', sizesRouter());
  router.use(citeRouter());
  router.use('/programmes', programmesRouter());
  router.use('/shared-programmes', sharedProgrammesRouter());
  router.use('/import', importRouter());
  router.use(workflowRouter());
  // Described from the router itself, after every resource is mounted.
  router.get('/openapi.json', (_req, res) => {
    res.json(buildOpenApi(router));
  });
  router.use(apiNotFound);
  return router;
}
