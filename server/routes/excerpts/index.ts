import { Router } from 'express';
import { createExcerptSchema, updateExcerptSchema } from '@shared/catalogue/schemas';
import { excerptIdParamsSchema, excerptRevisionParamsSchema, sourceIdParamsSchema } from '@shared/catalogue/requests';
import { validate } from '../../http/validate';
import { authorize, type Actor } from '../../policies';
import { excerptAbilities, excerptPolicy } from '../../policies/excerpt';
import { notFound } from '../../errors';
import { presentExcerptDetail } from '../../presenters/excerpt';
import { presentRevisionDetail, presentRevisionSummary } from '../../presenters/catalogue-revision';
import { findExcerptFor, revisionsFor, sizeNames } from '../../services/catalogue-read';
import { createExcerpt } from '../../commands/create-excerpt';
import { updateExcerpt } from '../../commands/update-excerpt';

/** `{ data: ExcerptDetail, abilities }` for this person. */
export async function excerptResponse(actor: Actor, publicId: string) {
  const view = await findExcerptFor(actor, publicId);
  return {
    data: presentExcerptDetail(view.excerpt, view.source.source, { sizeNames: await sizeNames(), showingApprovedVersion: view.showingApprovedVersion }),
    abilities: excerptAbilities(actor, view.current, view.source.current),
  };
}

/** `POST /api/sources/:id/excerpts`, mounted beside the sources router. */
export function sourceExcerptsRouter(): Router {
  const router = Router();
  router.post('/:id/excerpts', validate({ params: sourceIdParamsSchema, body: createExcerptSchema }), async (req, res) => {
    authorize(req.user, !!req.user);
    const excerpt = await createExcerpt(req.user, req.params.id as string, req.body);
    res.status(201).json(await excerptResponse(req.user, excerpt.publicId));
  });
  return router;
}

export function excerptsRouter(): Router {
  const router = Router();

  router.get('/:id', validate({ params: excerptIdParamsSchema }), async (req, res) => {
    res.json(await excerptResponse(req.user, req.params.id as string));
  });

  router.patch('/:id', validate({ params: excerptIdParamsSchema, body: updateExcerptSchema }), async (req, res) => {
    authorize(req.user, !!req.user);
    await updateExcerpt(req.user, req.params.id as string, req.body);
    res.json(await excerptResponse(req.user, req.params.id as string));
  });

  router.get('/:id/revisions', validate({ params: excerptIdParamsSchema }), async (req, res) => {
    const { current, source } = await findExcerptFor(req.user, req.params.id as string);
    const revisions = await revisionsFor('excerpt', current, excerptPolicy.readCurrent(req.user, current, source.current));
    res.json({ data: revisions.map(presentRevisionSummary) });
  });

  router.get('/:id/revisions/:version', validate({ params: excerptRevisionParamsSchema }), async (req, res) => {
    const { current, source } = await findExcerptFor(req.user, req.params.id as string);
    const revisions = await revisionsFor('excerpt', current, excerptPolicy.readCurrent(req.user, current, source.current));
    const revision = revisions.find((r) => r.version === Number(req.params.version));
    if (!revision) throw notFound(`Version ${req.params.version} of this excerpt`);
    res.json({ data: presentRevisionDetail(revision) });
  });

  return router;
}
