/**
 * Import of sources from BibTeX or RIS (contributors):
 * POST /api/import/preview  JSON { text, format } or multipart (`file`, optional `format`)
 *   → { data: { format, entries: ImportPreviewEntry[] } }; malformed input → 400 with the line.
 * POST /api/import          { entries: SourceInput[] } → 201 { data: { created: [{ id, title }] } }:
 *   draft sources for the signed-in contributor, all in one transaction (all or nothing), each
 *   with its first revision and search outbox row (the catalogue commands' own helpers).
 */
import { Router } from 'express';
import multer from 'multer';
import { Op } from 'sequelize';
import { z } from 'zod';
import { sourceFieldsSchema, type SourceFields } from '@shared/catalogue/schemas';
import { bibtexErrorFrom, checkRisSyntax, cslToSourceInput, importFormats, recordLines, type ImportFormat } from '@shared/citations/import';
import type { ImportPreviewEntry } from '@shared/citations/import-types';
import { fieldErrors, parseOrThrow, validate } from '../../http/validate';
import { allow } from '../../policies';
import { sourcePolicy } from '../../policies/source';
import { Source } from '../../models';
import { badRequest } from '../../errors';
import { getSequelize } from '../../db';
import { parseBibliographic } from '../../services/citations';
import { insertDraftSource } from '../../commands/create-source';

const MAX_BYTES = 2 * 1024 * 1024;
export const MAX_ENTRIES = 200;

const previewBodySchema = z
  .object({ text: z.string().max(MAX_BYTES).optional(), format: z.enum(importFormats, { error: 'Choose bibtex or ris' }).optional() })
  .strict();
const importBodySchema = z
  .object({ entries: z.array(sourceFieldsSchema).min(1, { error: 'Nothing to import' }).max(MAX_ENTRIES, { error: `Import at most ${MAX_ENTRIES} entries at once` }) })
  .strict();

function guessFormat(text: string, fileName?: string): ImportFormat {
  if (fileName && /\.ris$/i.test(fileName)) return 'ris';
  if (fileName && /\.(bib|bibtex)$/i.test(fileName)) return 'bibtex';
  return /^\s*TY {2}-/m.test(text) && !/^\s*@\w+\s*\{/m.test(text) ? 'ris' : 'bibtex';
}

/** Parses the text or throws a 400 naming the line. */
export function parseImport(text: string, format: ImportFormat): Record<string, unknown>[] {
  if (format === 'ris') {
    const error = checkRisSyntax(text);
    if (error) throw badRequest(error.message, { text: `Line ${error.line}: ${error.message}` });
  }
  let entries: Record<string, unknown>[];
  try {
    entries = parseBibliographic(text.replace(/^\uFEFF/, ''), format);
  } catch (cause) {
    const error = format === 'bibtex' ? bibtexErrorFrom(cause) : { line: 1, message: `The RIS text could not be read: ${(cause as Error).message}` };
    throw badRequest(error.message, { text: `Line ${error.line}: ${error.message}` });
  }
  if (!entries.length) throw badRequest(`No ${format === 'bibtex' ? 'BibTeX entry' : 'RIS record'} found.`, { text: 'Nothing to import.' });
  if (entries.length > MAX_ENTRIES) throw badRequest(`Import at most ${MAX_ENTRIES} entries at once.`);
  return entries;
}

const sameShelfmark = (shelfmark: string | null | undefined) => (shelfmark ? { shelfmark } : { shelfmark: { [Op.is]: null } });

export function importRouter(): Router {
  const router = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_BYTES, files: 1 } });

  router.post('/preview', allow(sourcePolicy.create, 'Only contributors import sources.'), upload.single('file'), async (req, res) => {
    const body = parseOrThrow(previewBodySchema, req.body ?? {});
    const text = req.file ? req.file.buffer.toString('utf8') : body.text;
    if (!text?.trim()) throw badRequest('Paste BibTeX or RIS text, or upload a .bib or .ris file.', { text: 'Nothing to read.' });
    const format = body.format ?? guessFormat(text, req.file?.originalname);
    const parsed = parseImport(text, format);
    const lines = recordLines(text, format);
    const entries: ImportPreviewEntry[] = [];
    for (const [index, csl] of parsed.entries()) {
      const fields = cslToSourceInput(csl);
      const check = sourceFieldsSchema.safeParse(fields);
      const dateEdtf = check.success ? check.data.dateEdtf : fields.dateEdtf;
      const duplicates = fields.title && dateEdtf
        ? await Source.findAll({ where: { title: fields.title, dateEdtf, ...sameShelfmark(fields.shelfmark) }, attributes: ['publicId', 'title', 'status'], limit: 5 })
        : [];
      const inBatch = entries.filter((e) => e.fields.title === fields.title && e.fields.dateEdtf === fields.dateEdtf && (e.fields.shelfmark ?? null) === (fields.shelfmark ?? null));
      entries.push({
        index,
        line: lines[index] ?? null,
        key: typeof csl['citation-key'] === 'string' ? csl['citation-key'] : typeof csl.id === 'string' ? csl.id : null,
        fields,
        errors: check.success ? null : fieldErrors(check.error),
        duplicates: [
          ...duplicates.map((d) => ({ id: d.publicId, title: d.title, status: d.status, message: `Same title, date and shelfmark as ${d.publicId}.` })),
          ...inBatch.map((e) => ({ id: null, title: e.fields.title, status: null, message: `Same title, date and shelfmark as entry ${e.index + 1} of this import.` })),
        ],
      });
    }
    res.json({ data: { format, entries } });
  });

  router.post('/', allow(sourcePolicy.create, 'Only contributors import sources.'), validate({ body: importBodySchema }), async (req, res) => {
    const { entries } = req.body as { entries: SourceFields[] };
    const actor = req.user!;
    const created = await getSequelize().transaction(async (transaction) => {
      const rows: Source[] = [];
      for (const input of entries) {
        const source = await insertDraftSource(actor, input, 'Imported from BibTeX/RIS', transaction);
        rows.push(source);
      }
      return rows;
    });
    res.status(201).json({ data: { created: created.map((s) => ({ id: s.publicId, title: s.title })) } });
  });

  return router;
}
