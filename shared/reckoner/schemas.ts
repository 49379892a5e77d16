import { z } from 'zod';
import { A4_MAX_HZ, A4_MIN_HZ } from './pitch';
import { SIZE_SLUGS } from './sizes';

/**
 * Query-string schemas for the three reckon routes, shared by the server's validation and
 * the client's forms. Values arrive as strings; a′ is coerced to a number.
 */
const sizeSlug = z.string().trim().refine((slug) => SIZE_SLUGS.includes(slug), {
  message: `Unknown size: use one of ${SIZE_SLUGS.join(', ')}.`,
});

const a4 = z.coerce
  .number({ message: `a′ must be a number of hertz, e.g. 415.` })
  .refine(Number.isFinite, { message: 'a′ must be a number of hertz, e.g. 415.' })
  .min(A4_MIN_HZ, { message: `a′ must be at least ${A4_MIN_HZ} Hz.` })
  .max(A4_MAX_HZ, { message: `a′ must be at most ${A4_MAX_HZ} Hz.` });

export const reckonSoundingQuerySchema = z.object({
  size: sizeSlug,
  a: a4,
});

export const reckonFingeringQuerySchema = z.object({
  size: sizeSlug,
  key: z.string({ message: 'Give a key such as "F major" or "B minor".' }).trim().min(1, { message: 'Give a key such as "F major" or "B minor".' }).max(40),
  fingering: z.enum(['C', 'F'], { message: 'Fingering must be C or F.' }),
});

export const reckonDateQuerySchema = z.object({
  value: z.string({ message: 'Give an EDTF date, e.g. 1700, 1700-02-10, 1700~, 1700/1725.' }).trim().min(1, { message: 'Give an EDTF date, e.g. 1700, 1700-02-10, 1700~, 1700/1725.' }).max(200),
  calendar: z.enum(['gregorian', 'julian'], { message: 'Calendar must be gregorian or julian.' }).default('gregorian'),
  yearStart: z.enum(['jan1', 'mar25'], { message: 'Year start must be jan1 or mar25 (Lady Day).' }).default('jan1'),
});

export type ReckonSoundingQuery = z.infer<typeof reckonSoundingQuerySchema>;
export type ReckonFingeringQuery = z.infer<typeof reckonFingeringQuerySchema>;
export type ReckonDateQuery = z.infer<typeof reckonDateQuerySchema>;
