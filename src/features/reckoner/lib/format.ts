import { roundTo } from '@shared/reckoner';

const GLYPHS: Record<string, string> = { '##': '𝄪', bb: '𝄫', '#': '♯', b: '♭' };
const WORDS: Record<string, string> = { '##': 'double sharp', bb: 'double flat', '#': 'sharp', b: 'flat' };
/** A note letter with an ASCII accidental, as the shared code spells notes and keys ("C#4", "Eb major"). */
const SPELLED = /\b([A-G])(##|bb|#|b)(?=-?\d|\s|$|[,.;)])/g;

/** "C#4" → "C♯4", "Bb major" → "B♭ major". */
export function musicGlyphs(text: string): string {
  return text.replace(SPELLED, (_, letter: string, accidental: string) => letter + GLYPHS[accidental]);
}

/** "C#4" → "C sharp 4", "Bb major" → "B flat major": what a screen reader should say. */
export function musicWords(text: string): string {
  return text
    .replace(SPELLED, (_, letter: string, accidental: string) => `${letter} ${WORDS[accidental]}`)
    .replace(/(sharp|flat)(-?\d)/g, '$1 $2');
}

/** Cents to one decimal with a true minus sign: "−1.3", "+12.0", "±0.0". */
export function formatCents(cents: number): string {
  const value = roundTo(cents, 1);
  const sign = value > 0 ? '+' : value < 0 ? '−' : '±';
  return `${sign}${Math.abs(value).toFixed(1)}`;
}

export function spokenCents(cents: number): string {
  const value = roundTo(cents, 1);
  return `${value < 0 ? 'minus ' : value > 0 ? 'plus ' : ''}${Math.abs(value).toFixed(1)} cents`;
}

export function formatHz(hz: number): string {
  return roundTo(hz, 2).toFixed(2);
}

/** A key signature as a count: "3♭", "2♯", "none". */
export function signatureText(count: number): string {
  if (count === 0) return 'none';
  return count < 0 ? `${-count}♭` : `${count}♯`;
}

export function spokenSignature(count: number): string {
  if (count === 0) return 'no sharps or flats';
  const n = Math.abs(count);
  return `${n} ${count < 0 ? 'flat' : 'sharp'}${n === 1 ? '' : 's'}`;
}

export function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** Path and query of a reckon API call, for the "same answer from the API" note. */
export function apiUrl(path: string, query: Record<string, string>): string {
  return `/api/reckon/${path}?${new URLSearchParams(query).toString()}`;
}
