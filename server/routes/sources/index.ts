import { Router } from 'express';
import { createSourceSchema, updateSourceSchema } from '@shared/catalogue/schemas';
import { listSourcesQuerySchema, sourceIdParamsSchema, sourceRevisionParamsSchema, workflowStepSchema, type ListSourcesQuery } from '@shared/catalogue/requests';
import type { SessionUser } from '../../auth/passport';
import { validate } from '../../http/validate';
import { allow, authorize, type Actor } from '../../policies';
import { sourceAbilities, sourcePolicy } from '../../policies/source';
import { Facsimile, User } from '../../models';
import { notFound } from '../../errors';
import { presentSourceDetail, presentSourceSummary } from '../../presenters/source';
import { presentExcerptSummary } from '../../presenters/excerpt';
import { presentRevisionDetail, presentRevisionSummary } from '../../presenters/catalogue-revision';
import { excerptsFor, findSourceFor, revisionsFor, type SourceView } from '../../services/catalogue-read';
import { listSources } from '../../services/source-list';
import { createSource } from '../../commands/create-source';
import { updateSource } from '../../commands/update-source';
import { submitSource } from '../../commands/submit-source';
import { reopenSource, withdrawSource } from '../../commands/withdraw-source';

/** `{ data: SourceDetail, abilities }` for this person, after a read or a write. */
export async function sourceResponse(actor: Actor, publicId: string) {
  const view: SourceView = await findSourceFor(actor, publicId);
  const [facsimiles, excerpts] = await Promise.all([
    Facsimile.findAll({ where: { sourceId: view.current.id }, include: [{ model: User, as: 'uploadedBy', attributes: ['id', 'displayName'] }], order: [['id', 'ASC']] }),
    excerptsFor(actor, view.current),
  ]);
  return {
    data: presentSourceDetail(view.source, {
      facsimiles,
      excerpts: excerpts.map((e) => presentExcerptSummary(e, view.source)),
      showingApprovedVersion: view.showingApprovedVersion,
    }),
    abilities: sourceAbilities(actor, view.current),
  };
}

export function sourcesRouter(): Router {
  const router = Router();

  router.get('/', validate({ query: listSourcesQuerySchema }), async (req, res) => {
    const query = req.query as unknown as ListSourcesQuery;
    const { views, total } = await listSources(req.user, query);
    res.json({ data: views.map((v) => presentSourceSummary(v.source)), total, page: query.page, perPage: query.perPage });
  });

  router.post('/', allow(sourcePolicy.create, 'Only contributors and editors catalogue sources.'), validate({ body: createSourceSchema }), async (req, res) => {
    const source = await createSource(req.user!, req.body);
    res.status(201).json(await sourceResponse(req.user, source.publicId));
  });

  router.get('/:id', validate({ params: sourceIdParamsSchema }), async (req, res) => {
    res.json(await sourceResponse(req.user, req.params.id as string));
  });

  router.patch('/:id', validate({ params: sourceIdParamsSchema, body: updateSourceSchema }), async (req, res) => {
    authorize(req.user, !!req.user);
    await updateSource(req.user, req.params.id as string, req.body);
    res.json(await sourceResponse(req.user, req.params.id as string));
  });

  router.post('/:id/submit', validate({ params: sourceIdParamsSchema, body: workflowStepSchema }), async (req, res) => {
    authorize(req.user, !!req.user);
    const { excerpts } = await submitSource(req.user, req.params.id as string, req.body.reason);
    res.json({ ...(await sourceResponse(req.user, req.params.id as string)), submittedExcerpts: excerpts.map((e) => e.publicId) });
  });

  const step = (run: (actor: SessionUser, id: string, reason?: string) => Promise<unknown>) =>
    [
      validate({ params: sourceIdParamsSchema, body: workflowStepSchema }),
      async (req: import('express').Request, res: import('express').Response) => {
        authorize(req.user, !!req.user);
        await run(req.user, req.params.id as string, req.body.reason);
        res.json(await sourceResponse(req.user, req.params.id as string));
      },
    ] as const;
  router.post('/:id/withdraw', ...step(withdrawSource));
  router.post('/:id/reopen', ...step(reopenSource));

  router.get('/:id/excerpts', validate({ params: sourceIdParamsSchema }), async (req, res) => {
    const view = await findSourceFor(req.user, req.params.id as string);
    const excerpts = await excerptsFor(req.user, view.current);
    res.json({ data: excerpts.map((e) => presentExcerptSummary(e, view.source)) });
  });

  router.get('/:id/revisions', validate({ params: sourceIdParamsSchema }), async (req, res) => {
    const { current } = await findSourceFor(req.user, req.params.id as string);
    const revisions = await revisionsFor('source', current, sourcePolicy.readCurrent(req.user, current));
    res.json({ data: revisions.map(presentRevisionSummary) });
  });

  router.get('/:id/revisions/:version', validate({ params: sourceRevisionParamsSchema }), async (req, res) => {
    const { current } = await findSourceFor(req.user, req.params.id as string);
    const revisions = await revisionsFor('source', current, sourcePolicy.readCurrent(req.user, current));
    const revision = revisions.find((r) => r.version === Number(req.params.version));
    if (!revision) throw notFound(`Version ${req.params.version} of this source`);
    res.json({ data: presentRevisionDetail(revision) });
  });

  return router;
}
