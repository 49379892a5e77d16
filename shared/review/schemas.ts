import { z } from 'zod';
import { reviewDecisions, sourceTypes } from '../catalogue/vocabulary';
import { languageTagSchema } from '../catalogue/schemas';
import { SIZE_SLUGS } from '../reckoner/sizes';
import { entityKinds } from './types';

export const publicIdSchema = z.string().trim().toUpperCase().regex(/^[A-Za-z0-9_-]{1,12}$/, { error: 'Not a Windway id' });
export const entityKindSchema = z.enum(entityKinds, { error: 'Use source or excerpt' });
const versionSchema = z.coerce.number({ error: 'Give a version number' }).int().positive({ error: 'Versions start at 1' });

export const targetParamsSchema = z.object({ kind: entityKindSchema, id: publicIdSchema });
export const versionParamsSchema = targetParamsSchema.extend({ version: versionSchema });

export const reviewQueueQuerySchema = z
  .object({
    kind: entityKindSchema.optional(),
    sourceType: z.enum(sourceTypes).optional(),
    /** A user id, or part of a display name. */
    contributor: z.string().trim().max(80).optional(),
    minAgeDays: z.coerce.number().int().min(0).max(3650).optional(),
    maxAgeDays: z.coerce.number().int().min(0).max(3650).optional(),
    lang: languageTagSchema.optional(),
    sort: z.enum(['oldest', 'newest']).default('oldest'),
    page: z.coerce.number().int().min(1).default(1),
    perPage: z.coerce.number().int().min(1).max(100).default(25),
  })
  .strict();

export const fieldCommentSchema = z
  .object({
    field: z.string().trim().min(1, { error: 'Name the field' }).max(40),
    comment: z.string().trim().min(1, { error: 'Write the comment' }).max(4000),
  })
  .strict();

export const decisionSchema = z
  .object({
    target: z.object({ kind: entityKindSchema, id: publicIdSchema, version: z.number({ error: 'Send the version you reviewed' }).int().positive() }).strict(),
    decision: z.enum(reviewDecisions, { error: `Choose one of: ${reviewDecisions.join(', ')}` }),
    comment: z
      .string()
      .trim()
      .max(8000)
      .optional()
      .transform((v) => v || undefined),
    fieldComments: z.array(fieldCommentSchema).max(50).default([]),
  })
  .strict();

/** Resubmitting one excerpt: the version the contributor last saw (optional) and a note for the history. */
export const submitExcerptSchema = z
  .object({ version: z.number({ error: 'Send the version you are submitting' }).int().positive().optional(), reason: z.string().trim().max(500).optional() })
  .strict();

export const diffQuerySchema = z
  .object({ from: versionSchema.optional(), to: versionSchema.optional() })
  .strict();

export const restoreSchema = z
  .object({
    version: z.number({ error: 'Choose the version to restore' }).int().positive(),
    reason: z.string({ error: 'Say why this version is restored' }).trim().min(3, { error: 'Say why this version is restored' }).max(500),
    /** The version the editor was looking at; a newer one on the server means 409. */
    baseVersion: z.number().int().positive().optional(),
  })
  .strict();

const sizeSlugSchema = z.enum(SIZE_SLUGS as [string, ...string[]], { error: `Choose a size: ${SIZE_SLUGS.join(', ')}` });

export const concordancePatchSchema = z
  .object({
    term: z.string().trim().min(1, { error: 'Give the term as written' }).max(200),
    language: languageTagSchema,
    fromSize: sizeSlugSchema.optional(),
    toSize: sizeSlugSchema,
    mergeInto: z.object({ term: z.string().trim().min(1, { error: 'Give the spelling to keep' }).max(200) }).strict().optional(),
    reason: z.string().trim().max(300).optional(),
  })
  .strict();

export type ReviewQueueQuery = z.output<typeof reviewQueueQuerySchema>;
export type DecisionInput = z.input<typeof decisionSchema>;
export type Decision = z.output<typeof decisionSchema>;
export type RestoreInput = z.input<typeof restoreSchema>;
export type ConcordancePatch = z.input<typeof concordancePatchSchema>;
