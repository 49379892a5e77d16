import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { sourceTypeLabels, sourceTypes } from '@shared/catalogue/vocabulary';
import { SIZE_FAMILIES } from '@shared/search/schema';

export const sizeName = (slug: string) => INSTRUMENT_SIZES.find((s) => s.slug === slug)?.name ?? slug;

export const sizeOptions = INSTRUMENT_SIZES.map((s) => ({ value: s.slug, label: s.name }));
export const familyOptions = SIZE_FAMILIES.map((f) => ({ value: f, label: f === 'flute' ? 'Transverse flute' : f === 'recorder' ? 'Recorder' : f }));
export const typeOptions = sourceTypes.map((t) => ({ value: t, label: sourceTypeLabels[t] }));

const languageNames = typeof Intl.DisplayNames === 'function' ? new Intl.DisplayNames(['en'], { type: 'language' }) : null;
export function languageName(tag: string): string {
  try {
    return languageNames?.of(tag) ?? tag;
  } catch {
    return tag;
  }
}
/** Languages in the facet counts, named, most frequent first. */
export const languageOptions = (counts: Record<string, number>, selected: readonly string[]) =>
  [...new Set([...Object.keys(counts), ...selected])]
    .sort((a, b) => (counts[b] ?? 0) - (counts[a] ?? 0) || a.localeCompare(b))
    .map((tag) => ({ value: tag, label: languageName(tag) }));
