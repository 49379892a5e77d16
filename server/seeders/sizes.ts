import { InstrumentSizeRecord } from '../models';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';

/**
 * Makes sure every seed size exists (by slug). Idempotent, and never overwrites what
 * editors changed since: existing rows are left alone. Returns the slugs it created.
 */
export async function seedInstrumentSizes(): Promise<string[]> {
  const created: string[] = [];
  for (const [index, size] of INSTRUMENT_SIZES.entries()) {
    const [, wasCreated] = await InstrumentSizeRecord.findOrCreate({
      where: { slug: size.slug },
      defaults: {
        slug: size.slug,
        family: size.family,
        name: size.name,
        otherNames: [...size.otherNames],
        nominalNote: size.nominalLowest,
        writtenOctaveOffset: size.writtenOctaveOffset,
        rangeLowest: size.usualRange.lowest,
        rangeHighest: size.usualRange.highest,
        hornbostelSachs: size.hornbostelSachs,
        sortOrder: (index + 1) * 10,
      },
    });
    if (wasCreated) created.push(size.slug);
  }
  return created;
}
