/**
 * Citation export (contract in shared/citations/api.ts):
 * GET /api/excerpts/:id/cite, GET /api/sources/:id/cite, POST /api/cite, GET /api/cite/styles.
 * Mounted at /api itself, so the two per-item routes sit beside the catalogue's own routers.
 */
import { Router, type Request, type Response } from 'express';
import {
  citeManySchema, citeParamsSchema, citeQuerySchema, contentTypes, fileExtensions,
  type CiteFormat, type CiteManyBody, type CiteQuery, type CiteResponse,
} from '@shared/citations/api';
import { validate } from '../../http/validate';
import { invalid } from '../../errors';
import { findCitables, formatCitations, listStylesJson, loadCitable, registerDefaultStyles, toCitable, useStyle, type Citable } from '../../services/citations';

const styledFormats: CiteFormat[] = ['text', 'html'];

function wantsJson(req: Request): boolean {
  const first = (req.get('accept') ?? '').split(',')[0].trim().toLowerCase();
  return first.startsWith('application/json');
}

function send(req: Request, res: Response, citables: Citable[], format: CiteFormat, style: string, name: string, download: boolean) {
  // The style is checked for every format, so a bad name is always a 400, never ignored.
  useStyle(style);
  const result = formatCitations(citables, format, style);
  if (wantsJson(req)) {
    const body: CiteResponse = {
      format,
      style: styledFormats.includes(format) ? style : null,
      data: result.data,
      items: result.items as unknown as Record<string, unknown>[],
      ...(result.entries ? { entries: result.entries } : {}),
    };
    res.json(body);
    return;
  }
  if (download) res.attachment(`windway-${name}.${fileExtensions[format]}`);
  res.type(contentTypes[format]);
  res.send(result.data);
}

export function citeRouter(): Router {
  const router = Router();
  registerDefaultStyles();

  router.get('/cite/styles', (_req, res) => {
    res.set('Cache-Control', 'public, max-age=3600');
    res.type('application/json').send(listStylesJson());
  });

  for (const kind of ['excerpt', 'source'] as const) {
    router.get(`/${kind}s/:id/cite`, validate({ params: citeParamsSchema, query: citeQuerySchema }), async (req, res) => {
      const query = req.query as unknown as CiteQuery;
      const target = await loadCitable(req.params.id as string, kind, query.version);
      send(req, res, [toCitable(target)], query.format, query.style, target.id, query.download === '1');
    });
  }

  router.post('/cite', validate({ body: citeManySchema }), async (req, res) => {
    const body = req.body as CiteManyBody;
    useStyle(body.style);
    const { found, missing } = await findCitables(body.ids);
    if (missing.length) {
      throw invalid(Object.fromEntries(missing.map((id) => [`ids.${body.ids.indexOf(id)}`, `${id} was not found or is not public.`])), 'Some ids cannot be cited.');
    }
    const citables = [...found.values()].map((t) => toCitable(t));
    send(req, res, citables, body.format, body.style, 'citations', req.query.download === '1');
  });

  return router;
}
