import { z } from 'zod';
import { describeEdtf } from '../reckoner/dates';
import { ReckonerError } from '../reckoner/errors';
import { A4_MAX_HZ, A4_MIN_HZ } from '../reckoner/pitch';
import { SIZE_SLUGS } from '../reckoner/sizes';
import {
  calendarNotes,
  certainties,
  creatorRoles,
  facsimileAccessLevels,
  locatorTypes,
  pitchDerivations,
  sourceTypes,
} from './vocabulary';
import { isValidLocator, locatorMessage } from './locator';

/** Limits shared by the database columns, the API and the forms. */
export const limits = {
  title: 500,
  shortText: 255,
  transcription: 20_000,
  commentary: 20_000,
  creators: 20,
  languages: 10,
  topics: 20,
  mentions: 50,
  pitchTags: 20,
} as const;

/** Valid when `describeEdtf` can give its earliest and latest day; the message says what is accepted. */
export const edtfSchema = z
  .string({ error: 'Enter a date in EDTF, e.g. 1700, 1700~ or 1700/1725' })
  .trim()
  .min(1, { error: 'Enter a date in EDTF, e.g. 1700, 1700~ or 1700/1725' })
  .max(100)
  .superRefine((value, ctx) => {
    try {
      describeEdtf(value);
    } catch (error) {
      ctx.addIssue({ code: 'custom', message: error instanceof ReckonerError ? error.message : 'Not an EDTF date.' });
    }
  });

/** BCP 47 language tags such as `en`, `fr`, `de-AT`, `la`, `nl`, `it`, `en-GB`. */
export const languageTagSchema = z
  .string()
  .trim()
  .regex(/^[a-z]{2,3}(-[A-Z][a-z]{3})?(-([A-Z]{2}|\d{3}))?$/, { error: 'Use a BCP 47 language tag such as en, fr, de, la, it or nl' });

const optionalText = (max: number = limits.shortText) =>
  z
    .string()
    .trim()
    .max(max, { error: `Use at most ${max} characters` })
    .nullish()
    .transform((v) => (v ? v : null));

export const creatorSchema = z
  .object({
    name: z.string().trim().min(1, { error: 'Enter the name as the source gives it' }).max(200),
    role: z.enum(creatorRoles, { error: `Choose one of: ${creatorRoles.join(', ')}` }),
  })
  .strict();

export const publicationSchema = z
  .object({
    publisher: optionalText(),
    place: optionalText(),
    edition: optionalText(),
  })
  .strict();

/** The editable fields of a source: one schema for the form, the route and the tests. */
export const sourceFieldsSchema = z
  .object({
    title: z.string().trim().min(1, { error: 'Enter the title as it appears, or a descriptive title in [brackets]' }).max(limits.title),
    sourceType: z.enum(sourceTypes, { error: 'Choose the kind of source' }),
    creators: z.array(creatorSchema).max(limits.creators).default([]),
    dateEdtf: edtfSchema,
    calendarNote: z.enum(calendarNotes).default('unstated'),
    place: optionalText(),
    languages: z.array(languageTagSchema).min(1, { error: 'Add at least one language (BCP 47), e.g. en' }).max(limits.languages),
    holdingInstitution: optionalText(),
    shelfmark: optionalText(),
    publication: publicationSchema.nullish().transform((v) => v ?? null),
    externalUrl: z
      .url({ protocol: /^https?$/, error: 'Use a full http(s) address' })
      .max(1000)
      .nullish()
      .or(z.literal('').transform(() => null))
      .transform((v) => v ?? null),
    rightsStatement: optionalText(2000),
    facsimileAccess: z.enum(facsimileAccessLevels).default('signed-in'),
  })
  .strict();

export const createSourceSchema = sourceFieldsSchema;
/**
 * `.partial()` keeps `.default()`s, so a PATCH omitting `creators` or `mentions` would reset them:
 * update schemas drop the defaults and leave absent fields absent.
 */
function partialWithoutDefaults<T extends z.ZodRawShape>(shape: T) {
  const fields = Object.fromEntries(
    Object.entries(shape).map(([key, field]) => [key, ((field instanceof z.ZodDefault ? field.unwrap() : field) as z.ZodType).optional()]),
  );
  return z.object(fields as unknown as { [K in keyof T]: z.ZodOptional<T[K] extends z.ZodDefault<infer I> ? I : T[K]> });
}

/** What every PATCH adds: the version it was based on, a reason, and (editors only) `publish` to keep approved material approved. */
const updateMeta = {
  version: z.number({ error: 'Send the version you edited' }).int().positive(),
  reason: z.string().trim().max(500).optional(),
  publish: z.boolean({ error: 'publish is true or false' }).optional(),
};

/** A PATCH carries the version it was based on (optimistic locking) and an optional reason. */
export const updateSourceSchema = partialWithoutDefaults(sourceFieldsSchema.shape).extend(updateMeta).strict();

export const mentionSchema = z
  .object({
    term: z.string().trim().min(1, { error: 'Enter the term as written' }).max(200),
    language: languageTagSchema,
    sizeSlug: z.enum(SIZE_SLUGS as [string, ...string[]], { error: `Choose a size: ${SIZE_SLUGS.join(', ')}` }),
    certainty: z.enum(certainties).default('probable'),
    note: optionalText(1000),
  })
  .strict();

export const pitchTagSchema = z
  .object({
    statement: z.string().trim().min(1, { error: 'Quote what the source says about pitch' }).max(1000),
    aHz: z
      .number({ error: 'Enter a′ in hertz, e.g. 415' })
      .min(A4_MIN_HZ, { error: `a′ must be between ${A4_MIN_HZ} and ${A4_MAX_HZ} Hz` })
      .max(A4_MAX_HZ, { error: `a′ must be between ${A4_MIN_HZ} and ${A4_MAX_HZ} Hz` }),
    derivation: z.enum(pitchDerivations).default('stated'),
    note: optionalText(1000),
  })
  .strict();

export const excerptFieldsSchema = z
  .object({
    locatorType: z.enum(locatorTypes, { error: `Choose one of: ${locatorTypes.join(', ')}` }),
    locatorValue: z.string().trim().min(1, { error: 'Enter where the passage is, e.g. 12v' }).max(40),
    facsimilePage: z.number().int().positive().nullish().transform((v) => v ?? null),
    diplomatic: z.string().max(limits.transcription).min(1, { error: 'Transcribe the passage as written' }),
    normalised: optionalText(limits.transcription),
    translation: optionalText(limits.transcription),
    translationLanguage: languageTagSchema.nullish().transform((v) => v ?? null),
    translator: optionalText(200),
    commentary: optionalText(limits.commentary),
    dateEdtf: edtfSchema.nullish().transform((v) => v ?? null),
    topics: z.array(z.string().trim().min(1).max(60)).max(limits.topics).default([]),
    mentions: z.array(mentionSchema).max(limits.mentions).default([]),
    pitchTags: z.array(pitchTagSchema).max(limits.pitchTags).default([]),
  })
  .strict();

/** Locator value must fit its type; checked on the whole object so the message names `locatorValue`. */
const locatorRule = (value: { locatorType?: string; locatorValue?: string }, ctx: z.RefinementCtx) => {
  if (!value.locatorType || !value.locatorValue) return;
  const type = value.locatorType as (typeof locatorTypes)[number];
  if (!isValidLocator(type, value.locatorValue)) ctx.addIssue({ code: 'custom', path: ['locatorValue'], message: locatorMessage(type) });
};

export const createExcerptSchema = excerptFieldsSchema.superRefine(locatorRule);
export const updateExcerptSchema = partialWithoutDefaults(excerptFieldsSchema.shape).extend(updateMeta).strict().superRefine(locatorRule);

export type SourceFields = z.output<typeof sourceFieldsSchema>;
export type SourceInput = z.input<typeof sourceFieldsSchema>;
export type ExcerptFields = z.output<typeof excerptFieldsSchema>;
export type ExcerptInput = z.input<typeof excerptFieldsSchema>;
export type MentionFields = z.output<typeof mentionSchema>;
export type PitchTagFields = z.output<typeof pitchTagSchema>;
