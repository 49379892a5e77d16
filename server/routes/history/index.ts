import { Router } from 'express';
import { validate } from '../../http/validate';
import { allow, authorize } from '../../policies';
import { reviewPolicy } from '../../policies/review';
import { Revision, User } from '../../models';
import { badRequest, notFound } from '../../errors';
import { presentRevision, presentVersion, snapshotStatus } from '../../presenters/revision';
import { diffSnapshots } from '../../services/diffs';
import { excerptTitle } from '../../presenters/review';
import { restoreRevision } from '../../commands/restore-revision';
import { diffQuerySchema, restoreSchema, targetParamsSchema, versionParamsSchema } from '@shared/review/schemas';
import type { EntityKind, VersionDiff } from '@shared/review/types';
import { findTarget, ownerScope, type LoadedTarget } from '../reviews/targets';

const authorInclude = { model: User, as: 'author', attributes: ['id', 'displayName'] };

async function revisionsOf(target: LoadedTarget): Promise<Revision[]> {
  return Revision.findAll({ where: { entityType: target.kind, entityId: target.item.id }, include: [authorInclude], order: [['version', 'ASC']] });
}

/** Versions readers saw as approved: approved snapshots, and the item's approved version. */
function approvedVersions(target: LoadedTarget, revisions: Revision[]): Set<number> {
  const set = new Set(revisions.filter((r) => snapshotStatus(r.snapshot) === 'approved').map((r) => r.version));
  if (target.item.approvedVersion) set.add(target.item.approvedVersion);
  return set;
}

const titleOf = (target: LoadedTarget) => (target.kind === 'source' ? target.source.title : excerptTitle(target.item, target.source));

/**
 * Revision history of sources and excerpts. Editors and the contributor see every
 * version; everyone else only versions that were approved (what a citation can name).
 */
export function historyRouter(): Router {
  const router = Router();

  async function load(req: { params: Record<string, unknown>; user?: Express.User }) {
    const target = await findTarget(req.params.kind as EntityKind, req.params.id as string);
    const revisions = await revisionsOf(target);
    const approved = approvedVersions(target, revisions);
    const all = reviewPolicy.readAllVersions(req.user, target.item, ownerScope(target));
    const visible = all ? revisions : revisions.filter((r) => approved.has(r.version));
    if (!visible.length) throw notFound(target.kind === 'source' ? 'The source' : 'The excerpt');
    return { target, revisions: visible, approved, all };
  }

  router.get('/:kind/:id', validate({ params: targetParamsSchema }), async (req, res) => {
    const { target, revisions, approved, all } = await load(req);
    res.json({
      data: revisions.map((r) => presentRevision(r, approved)).reverse(),
      item: { kind: target.kind, id: target.item.publicId, title: titleOf(target), status: target.item.status, version: target.item.version, approvedVersion: target.item.approvedVersion },
      abilities: { restore: reviewPolicy.restore(req.user), seesAllVersions: all },
    });
  });

  router.get('/:kind/:id/diff', validate({ params: targetParamsSchema, query: diffQuerySchema }), async (req, res) => {
    const { target, revisions } = await load(req);
    const query = req.query as unknown as { from?: number; to?: number };
    const to = query.to ?? revisions[revisions.length - 1].version;
    const from = query.from ?? revisions.filter((r) => r.version < to).at(-1)?.version;
    if (from !== undefined && from >= to) throw badRequest('`from` must be an earlier version than `to`.', { from: 'Choose an earlier version.' });
    const find = (v: number) => revisions.find((r) => r.version === v);
    const after = find(to);
    if (!after) throw notFound(`Version ${to}`);
    const before = from !== undefined ? find(from) : undefined;
    if (from !== undefined && !before) throw notFound(`Version ${from}`);
    const diff: VersionDiff = { kind: target.kind, id: target.item.publicId, from: before?.version ?? null, to, changes: diffSnapshots(target.kind, before?.snapshot ?? null, after.snapshot) };
    res.json({ data: diff });
  });

  router.get('/:kind/:id/v/:version', validate({ params: versionParamsSchema }), async (req, res) => {
    const { target, revisions } = await load(req);
    const revision = revisions.find((r) => r.version === Number(req.params.version));
    if (!revision) throw notFound(`Version ${String(req.params.version)}`);
    res.json({ data: presentVersion(target.kind, target.item.publicId, revision, { version: target.item.version, title: titleOf(target) }) });
  });

  router.post(
    '/:kind/:id/restore',
    allow(reviewPolicy.restore, 'Only editors restore earlier versions.'),
    validate({ params: targetParamsSchema, body: restoreSchema }),
    async (req, res) => {
      const result = await restoreRevision(req.user!, { kind: req.params.kind as EntityKind, publicId: req.params.id as string, ...req.body });
      const { item } = result.target;
      res.status(201).json({ data: { kind: result.target.kind, id: item.publicId, version: result.version, status: result.status, approvedVersion: item.approvedVersion } });
    },
  );

  return router;
}
