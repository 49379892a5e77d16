/**
 * Programmes: a signed-in reader's workspace (owner only; anyone else gets a 404).
 * GET/POST /api/programmes, GET/PATCH/DELETE /api/programmes/:id,
 * POST/DELETE /api/programmes/:id/share, GET /api/programmes/:id/export?format=html|docx|markdown|bib,
 * POST /api/programmes/preview (notes text → footnotes, bibliography, problems; before saving too),
 * POST /api/programmes/:id/preview (the saved notes), and GET /api/shared-programmes/:token (anyone).
 */
import { Router, type Response } from 'express';
import { randomBytes } from 'node:crypto';
import {
  createProgrammeSchema, exportQuerySchema, previewSchema, programmeIdParamsSchema, shareTokenParamsSchema, updateProgrammeSchema,
  type ExportFormat, type PreviewBody, type ProgrammeFields, type ProgrammeUpdate,
} from '@shared/programmes/schema';
import type { ProgrammePreview } from '@shared/programmes/types';
import { validate } from '../../http/validate';
import { allow, authorize, type Actor } from '../../policies';
import { programmePolicy } from '../../policies/programme';
import { Programme, User } from '../../models';
import { presentProgramme, presentProgrammeSummary, presentSharedProgramme } from '../../presenters/programme';
import { conflict, notFound, unauthenticated } from '../../errors';
import { newPublicId } from '../../services/public-ids';
import { useStyle } from '../../services/citations';
import { renderNotes, type RenderedNotes } from '../../services/citations/programme';
import { programmeBib, programmeHtml, programmeMarkdown } from '../../services/citations/programme-export';
import { programmeDocx } from '../../services/citations/programme-docx';

/** Loads a programme its owner may see; a 404 for anyone else (the programme's existence stays private). */
async function ownProgramme(actor: Actor, id: string): Promise<Programme> {
  if (!actor) throw unauthenticated();
  const programme = await Programme.findOne({ where: { publicId: id } });
  if (!programme || !programmePolicy.see(actor, programme)) throw notFound('The programme');
  return programme;
}

function previewBody(rendered: RenderedNotes): ProgrammePreview {
  const { html, notes, bibliography, problems, styleKind } = rendered;
  return { html, notes, bibliography, problems, styleKind };
}

function slug(title: string): string {
  return title.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'programme';
}

async function sendExport(res: Response, programme: Programme, format: ExportFormat) {
  const rendered = await renderNotes(programme.notesMarkdown, programme.citationStyle);
  const name = slug(programme.title);
  if (format === 'html') {
    res.attachment(`${name}.html`).type('text/html; charset=utf-8').send(await programmeHtml(programme, rendered));
  } else if (format === 'markdown') {
    res.attachment(`${name}.md`).type('text/markdown; charset=utf-8').send(await programmeMarkdown(programme, rendered));
  } else if (format === 'bib') {
    res.attachment(`${name}.bib`).type('text/plain; charset=utf-8').send(await programmeBib(programme, rendered));
  } else {
    const buffer = await programmeDocx(programme, rendered);
    res.attachment(`${name}.docx`).type('application/vnd.openxmlformats-officedocument.wordprocessingml.document').send(buffer);
  }
}

export function programmesRouter(): Router {
  const router = Router();

  router.get('/', allow(programmePolicy.list), async (req, res) => {
    const rows = await Programme.findAll({ where: { ownerId: req.user!.id }, order: [['updatedAt', 'DESC'], ['id', 'DESC']] });
    res.json({ data: rows.map(presentProgrammeSummary) });
  });

  router.post('/', allow(programmePolicy.create), validate({ body: createProgrammeSchema }), async (req, res) => {
    const fields = req.body as ProgrammeFields;
    useStyle(fields.citationStyle, 'citationStyle');
    const programme = await Programme.create({ ...fields, publicId: newPublicId('P'), ownerId: req.user!.id, shareToken: null });
    res.status(201).json({ data: presentProgramme(programme) });
  });

  router.post('/preview', allow(programmePolicy.list), validate({ body: previewSchema }), async (req, res) => {
    const body = req.body as PreviewBody;
    res.json({ data: previewBody(await renderNotes(body.notesMarkdown, body.citationStyle)) });
  });

  router.get('/:id', validate({ params: programmeIdParamsSchema }), async (req, res) => {
    res.json({ data: presentProgramme(await ownProgramme(req.user, req.params.id as string)) });
  });

  router.patch('/:id', validate({ params: programmeIdParamsSchema, body: updateProgrammeSchema }), async (req, res) => {
    const programme = await ownProgramme(req.user, req.params.id as string);
    authorize(req.user, programmePolicy.update(req.user, programme));
    const { version, ...changes } = req.body as ProgrammeUpdate;
    if (version !== programme.version) throw conflict('This programme was changed elsewhere; reload it and apply your change again.', { version: `Current version is ${programme.version}.` });
    if (changes.citationStyle) useStyle(changes.citationStyle, 'citationStyle');
    await programme.update({ ...changes, version: programme.version + 1 });
    res.json({ data: presentProgramme(programme) });
  });

  router.delete('/:id', validate({ params: programmeIdParamsSchema }), async (req, res) => {
    const programme = await ownProgramme(req.user, req.params.id as string);
    authorize(req.user, programmePolicy.delete(req.user, programme));
    await programme.destroy();
    res.status(204).end();
  });

  router.post('/:id/preview', validate({ params: programmeIdParamsSchema }), async (req, res) => {
    const programme = await ownProgramme(req.user, req.params.id as string);
    res.json({ data: previewBody(await renderNotes(programme.notesMarkdown, programme.citationStyle)) });
  });

  /** Creates the share link, or rotates it (the old link stops working). */
  router.post('/:id/share', validate({ params: programmeIdParamsSchema }), async (req, res) => {
    const programme = await ownProgramme(req.user, req.params.id as string);
    authorize(req.user, programmePolicy.share(req.user, programme));
    await programme.update({ shareToken: randomBytes(32).toString('base64url'), visibility: 'shared' });
    res.json({ data: presentProgramme(programme) });
  });

  router.delete('/:id/share', validate({ params: programmeIdParamsSchema }), async (req, res) => {
    const programme = await ownProgramme(req.user, req.params.id as string);
    authorize(req.user, programmePolicy.share(req.user, programme));
    await programme.update({ shareToken: null, visibility: 'private' });
    res.json({ data: presentProgramme(programme) });
  });

  router.get('/:id/export', validate({ params: programmeIdParamsSchema, query: exportQuerySchema }), async (req, res) => {
    const programme = await ownProgramme(req.user, req.params.id as string);
    await sendExport(res, programme, (req.query as unknown as { format: ExportFormat }).format);
  });

  return router;
}

/** GET /api/shared-programmes/:token (+ /preview, /export): read-only, anyone with the link. */
export function sharedProgrammesRouter(): Router {
  const router = Router();
  const byToken = async (token: string) => {
    const programme = await Programme.findOne({ where: { shareToken: token, visibility: 'shared' }, include: [{ model: User, as: 'owner', attributes: ['displayName'] }] });
    if (!programme) throw notFound('The shared programme');
    return programme;
  };
  router.get('/:token', validate({ params: shareTokenParamsSchema }), async (req, res) => {
    res.set('Cache-Control', 'no-store').json({ data: presentSharedProgramme(await byToken(req.params.token as string)) });
  });
  router.get('/:token/preview', validate({ params: shareTokenParamsSchema }), async (req, res) => {
    const programme = await byToken(req.params.token as string);
    res.json({ data: previewBody(await renderNotes(programme.notesMarkdown, programme.citationStyle)) });
  });
  router.get('/:token/export', validate({ params: shareTokenParamsSchema, query: exportQuerySchema }), async (req, res) => {
    await sendExport(res, await byToken(req.params.token as string), (req.query as unknown as { format: ExportFormat }).format);
  });
  return router;
}
