import type { InstrumentSizeRecord } from '../models';
import type { InstrumentSizeView } from '@shared/catalogue/types';

export function presentSize(size: InstrumentSizeRecord): InstrumentSizeView {
  return {
    slug: size.slug,
    family: size.family,
    name: size.name,
    otherNames: [...size.otherNames],
    nominalNote: size.nominalNote,
    writtenOctaveOffset: size.writtenOctaveOffset,
    range: { lowest: size.rangeLowest, highest: size.rangeHighest },
    hornbostelSachs: size.hornbostelSachs,
    sortOrder: size.sortOrder,
  };
}
