/** Query, parameter and small body schemas of the catalogue routes (the forms' schemas are in ./schemas). */
import { z } from 'zod';
import { parseNote } from '../reckoner/notes';
import { sourceTypes, workflowStates } from './vocabulary';
import { languageTagSchema } from './schemas';

const year = z.coerce.number({ error: 'Use a year such as 1700' }).int().min(1000).max(2100);

export const sourceSortKeys = ['title', 'date', 'createdAt', 'updatedAt'] as const;

export const listSourcesQuerySchema = z
  .object({
    page: z.coerce.number().int().min(1).default(1),
    perPage: z.coerce.number().int().min(1).max(100).default(25),
    /** `title`, `-title` (descending), `date`, `createdAt`, `updatedAt`; `order` may say it instead. */
    sort: z.enum([...sourceSortKeys, ...sourceSortKeys.map((k) => `-${k}` as const)]).default('-updatedAt'),
    order: z.enum(['asc', 'desc']).optional(),
    type: z.enum(sourceTypes, { error: `Use one of: ${sourceTypes.join(', ')}` }).optional(),
    status: z.enum(workflowStates, { error: `Use one of: ${workflowStates.join(', ')}` }).optional(),
    from: year.optional(),
    to: year.optional(),
    lang: languageTagSchema.optional(),
    q: z.string().trim().max(200).optional(),
    mine: z.enum(['0', '1', 'true', 'false']).transform((v) => v === '1' || v === 'true').optional(),
  })
  .strict()
  .refine((q) => q.from === undefined || q.to === undefined || q.from <= q.to, { path: ['to'], message: '`to` must not be before `from`' });
export type ListSourcesQuery = z.output<typeof listSourcesQuerySchema>;

const publicId = (prefix: 'S' | 'E', what: string) =>
  z
    .string()
    .trim()
    .toUpperCase()
    .regex(new RegExp(`^${prefix}[0-9A-HJKMNP-TV-Z]{7}$`), { error: `Not a ${what} id` });

export const sourceIdParamsSchema = z.object({ id: publicId('S', 'source') });
export const excerptIdParamsSchema = z.object({ id: publicId('E', 'excerpt') });
const versionParam = z.coerce.number({ error: 'Use a version number' }).int().positive();
export const sourceRevisionParamsSchema = sourceIdParamsSchema.extend({ version: versionParam });
export const excerptRevisionParamsSchema = excerptIdParamsSchema.extend({ version: versionParam });

export const facsimileIdParamsSchema = z.object({ id: z.coerce.number({ error: 'Not a facsimile id' }).int().positive() });
export const facsimilePageParamsSchema = facsimileIdParamsSchema.extend({
  n: z.coerce.number({ error: 'Use a page number' }).int().positive({ error: 'Pages count from 1' }),
});

/** Body of submit / withdraw / reopen: an optional note for the revision history. */
export const workflowStepSchema = z.object({ reason: z.string().trim().max(500).optional() }).strict();

/** The text fields sent beside the file in a facsimile upload (multipart). */
export const facsimileUploadFieldsSchema = z
  .object({
    rightsConfirmed: z.literal('true', {
      error: 'Confirm that you may upload this facsimile and that its rights statement covers it (rightsConfirmed=true)',
    }),
  })
  .strict();

const noteName = (field: string) =>
  z
    .string()
    .trim()
    .refine((value) => {
      try {
        parseNote(value);
        return true;
      } catch {
        return false;
      }
    }, { error: `Write ${field} in scientific pitch notation, e.g. F4 or C#6` });

/** What editors may change in the size vocabulary; the slug is a public contract and never changes. */
export const updateSizeSchema = z
  .object({
    name: z.string().trim().min(1, { error: 'Enter a name' }).max(80).optional(),
    otherNames: z.array(z.string().trim().min(1).max(80)).max(40).optional(),
    range: z.object({ lowest: noteName('the lowest note'), highest: noteName('the highest note') }).strict().optional(),
    hornbostelSachs: z
      .string()
      .trim()
      .regex(/^\d(\d|\.|-|\+|:)*$/, { error: 'Use a Hornbostel–Sachs number such as 421.221.12' })
      .max(40)
      .optional(),
  })
  .strict();
export const sizeSlugParamsSchema = z.object({ slug: z.string().trim().regex(/^[a-z0-9-]{1,40}$/, { error: 'Not a size slug' }) });
