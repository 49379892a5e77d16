/**
 * How each instrument size looks in Windway's charts: a colour AND a marker shape
 * AND a short label, so no reading depends on telling colours apart. The shape
 * names are Observable Plot's symbol names; `SizeMark` draws the same shapes in HTML.
 */
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';

export type SymbolName = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'times' | 'star' | 'wye' | 'hexagon' | 'asterisk' | 'triangle2';

export interface SizeStyle {
  key: string;
  label: string;
  /** Two or three letters printed beside marks and in tables. */
  short: string;
  color: string;
  symbol: SymbolName;
}

/** Our own palette: earthy, distinguishable on paper, each far from its neighbours in lightness too. */
const looks: Record<string, Omit<SizeStyle, 'key' | 'label'>> = {
  sopranino: { short: 'Sn', color: '#b0413e', symbol: 'triangle' },
  soprano: { short: 'S', color: '#d08a2e', symbol: 'diamond' },
  alto: { short: 'A', color: '#2b6a5f', symbol: 'circle' },
  'voice-flute': { short: 'VF', color: '#6b8f2a', symbol: 'square' },
  tenor: { short: 'T', color: '#3d5f9e', symbol: 'star' },
  bass: { short: 'B', color: '#7a4a8c', symbol: 'cross' },
  'great-bass': { short: 'GB', color: '#4a3b2a', symbol: 'wye' },
  contrabass: { short: 'CB', color: '#8a7b62', symbol: 'hexagon' },
  'flute-one-keyed': { short: 'Fl', color: '#1f7a9a', symbol: 'times' },
};

export const SEVERAL: SizeStyle = { key: 'several', label: 'Several sizes', short: '+', color: '#5b5247', symbol: 'asterisk' };
export const NO_SIZE: SizeStyle = { key: 'none', label: 'No size tagged', short: '–', color: '#8f8577', symbol: 'triangle2' };

const fallback = (slug: string): SizeStyle => ({ key: slug, label: slug.replace(/-/g, ' '), short: slug.slice(0, 2), color: '#6f6456', symbol: 'triangle2' });

export const SIZE_STYLES: readonly SizeStyle[] = INSTRUMENT_SIZES.map((s) => ({ key: s.slug, label: s.name, ...(looks[s.slug] ?? fallback(s.slug)) }));

const bySlug = new Map(SIZE_STYLES.map((s) => [s.key, s]));

export const sizeName = (slug: string) => bySlug.get(slug)?.label ?? fallback(slug).label;

/** The style an excerpt is drawn in: its one size, "several" or "none". */
export function styleOf(sizes: readonly string[]): SizeStyle {
  if (sizes.length === 0) return NO_SIZE;
  if (sizes.length > 1) return SEVERAL;
  return bySlug.get(sizes[0]) ?? fallback(sizes[0]);
}

/** The styles used by some data, in the fixed legend order. */
export function stylesIn(groups: readonly (readonly string[])[]): SizeStyle[] {
  const used = new Set(groups.map((g) => styleOf(g).key));
  return [...SIZE_STYLES, SEVERAL, NO_SIZE].filter((s) => used.has(s.key));
}

/** Plot scale options so colour and symbol follow the same size → style mapping. */
export function scalesFor(styles: readonly SizeStyle[]) {
  return {
    color: { type: 'categorical' as const, domain: styles.map((s) => s.key), range: styles.map((s) => s.color) },
    symbol: { domain: styles.map((s) => s.key), range: styles.map((s) => s.symbol) },
  };
}

export const sizesText = (sizes: readonly string[]) => (sizes.length ? sizes.map(sizeName).join(', ') : 'no size tagged');
