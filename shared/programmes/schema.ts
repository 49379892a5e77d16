/** Programmes: zod schemas for the API and the editor (one source of truth for limits and messages). */
import { z } from 'zod';
import { parseKey } from '../reckoner/fingering';
import { parseNote } from '../reckoner/notes';
import { A4_MAX_HZ, A4_MIN_HZ } from '../reckoner/pitch';
import { SIZE_SLUGS } from '../reckoner/sizes';
import { ReckonerError } from '../reckoner/errors';

export const programmeLimits = { title: 300, venue: 255, performers: 30, pieces: 60, notes: 200_000 } as const;
export const visibilities = ['private', 'shared'] as const;
export type Visibility = (typeof visibilities)[number];

const optionalText = (max: number) =>
  z.string().trim().max(max, { error: `Use at most ${max} characters` }).nullish().transform((v) => (v ? v : null));

const checked = (check: (value: string) => unknown) => (value: string, ctx: z.RefinementCtx) => {
  try {
    check(value);
  } catch (error) {
    ctx.addIssue({ code: 'custom', message: error instanceof ReckonerError ? error.message : String(error) });
  }
};

const noteSchema = z.string().trim().max(8).superRefine(checked((v) => parseNote(v))).nullish().transform((v) => v ?? null);

export const pieceSchema = z
  .object({
    title: z.string().trim().min(1, { error: 'Give the piece a title' }).max(300),
    composer: optionalText(200),
    /** Sounding key, e.g. "F major", "G minor". */
    key: z.string().trim().min(1, { error: 'Give the sounding key, e.g. F major' }).max(30).superRefine(checked((v) => parseKey(v))),
    sizeSlug: z.enum(SIZE_SLUGS as [string, ...string[]], { error: `Choose a size: ${SIZE_SLUGS.join(', ')}` }),
    aHz: z
      .number({ error: 'Enter a′ in hertz, e.g. 415' })
      .min(A4_MIN_HZ, { error: `a′ must be between ${A4_MIN_HZ} and ${A4_MAX_HZ} Hz` })
      .max(A4_MAX_HZ, { error: `a′ must be between ${A4_MIN_HZ} and ${A4_MAX_HZ} Hz` })
      .default(415),
    /** Sounding lowest and highest notes at modern pitch, e.g. F4 and G6. */
    lowest: noteSchema,
    highest: noteSchema,
    fingering: z.enum(['C', 'F']).default('F'),
  })
  .strict();

export const performerSchema = z
  .object({ name: z.string().trim().min(1, { error: 'Enter a name' }).max(200), role: optionalText(200) })
  .strict();

const styleSchema = z.string().trim().min(1).max(200).regex(/^[a-z0-9][a-z0-9._-]*$/i, { error: 'Use a style id from GET /api/cite/styles' });

export const programmeFieldsSchema = z
  .object({
    title: z.string().trim().min(1, { error: 'Give the programme a title' }).max(programmeLimits.title),
    performanceDate: z.iso.date({ error: 'Use a date like 2025-11-08' }).nullish().transform((v) => v ?? null),
    venue: optionalText(programmeLimits.venue),
    performers: z.array(performerSchema).max(programmeLimits.performers).default([]),
    pieces: z.array(pieceSchema).max(programmeLimits.pieces).default([]),
    notesMarkdown: z.string().max(programmeLimits.notes).default(''),
    citationStyle: styleSchema.default('notes'),
  })
  .strict();

export const createProgrammeSchema = programmeFieldsSchema;
export const updateProgrammeSchema = programmeFieldsSchema
  .partial()
  .extend({ version: z.number({ error: 'Send the version you edited' }).int().positive() })
  .strict();

export const programmeIdParamsSchema = z.object({ id: z.string().regex(/^P[0-9A-HJKMNP-TV-Z]{7}$/, { error: 'Not a programme id' }) }).strict();
export const shareTokenParamsSchema = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, { error: 'Not a share link' }) }).strict();

export const exportFormats = ['html', 'docx', 'markdown', 'bib'] as const;
export type ExportFormat = (typeof exportFormats)[number];
export const exportQuerySchema = z.object({ format: z.enum(exportFormats, { error: `Choose: ${exportFormats.join(', ')}` }) }).strict();

/** Live preview of notes text, for the editor (also works before the programme is saved). */
export const previewSchema = z
  .object({ notesMarkdown: z.string().max(programmeLimits.notes), citationStyle: styleSchema.default('notes') })
  .strict();

export type PieceFields = z.output<typeof pieceSchema>;
export type PieceInput = z.input<typeof pieceSchema>;
export type PerformerFields = z.output<typeof performerSchema>;
export type ProgrammeFields = z.output<typeof programmeFieldsSchema>;
export type ProgrammeInput = z.input<typeof programmeFieldsSchema>;
export type ProgrammeUpdate = z.output<typeof updateProgrammeSchema>;
export type PreviewBody = z.output<typeof previewSchema>;
