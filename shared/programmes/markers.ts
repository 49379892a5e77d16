/**
 * Citation markers in programme notes, in Pandoc's syntax: `[@E1234567, fol. 12v]`, `[@S1234567]`,
 * `[@E1 ; @E2]`, `[see @E1, p. 3]`, `[@E1, pp. 3–4 and passim]`. Pure: finds the markers, their
 * positions and items, and reports malformed ones; `checkIds` reports ids not in a known set.
 *
 * Rules (after Pandoc's citation syntax): a marker is `[`…`]` on one paragraph holding `@key`
 * items separated by `;`; `@` must open the item or follow a space or `-` (so `[a@b.c]` is not a
 * citation). Text before the key is the prefix; after a comma, the locator (with an optional label
 * such as `fol.`, `p.`, `col.`, `sig.`, `pl.`) and then any suffix. Keys are Windway ids.
 */
import type { LocatorType } from '../catalogue/vocabulary';

export const WINDWAY_ID = /^[SE][0-9A-HJKMNP-TV-Z]{7}$/;

export interface MarkerItem {
  key: string;
  prefix: string;
  /** The locator as written without its label, e.g. `12v`, `3–4`. */
  locator: string | null;
  /** The label written, mapped to a catalogue locator type; null when none was written. */
  locatorType: LocatorType | null;
  suffix: string;
  /** `[-@E1]`: Pandoc's "suppress author". Kept for fidelity; Windway's notes ignore it. */
  suppressAuthor: boolean;
}

export interface Marker {
  start: number;
  end: number;
  raw: string;
  items: MarkerItem[];
}

export interface MarkerProblem {
  kind: 'malformed' | 'unknown-id';
  start: number;
  end: number;
  line: number;
  column: number;
  message: string;
  key?: string;
}

export interface ParsedMarkers {
  markers: Marker[];
  problems: MarkerProblem[];
}

const LABELS: [RegExp, LocatorType][] = [
  [/^(fols?\.|ff?\.|folios?)\s*/i, 'folio'],
  [/^(pp?\.|pages?)\s*/i, 'page'],
  [/^(cols?\.|columns?)\s*/i, 'column'],
  [/^(sigs?\.|signatures?)\s*/i, 'signature'],
  [/^(pls?\.|plates?)\s*/i, 'plate'],
];

/** Line and column (1-based) of an offset. */
export function positionOf(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset);
  const line = before.split('\n').length;
  return { line, column: offset - before.lastIndexOf('\n') };
}

function problem(text: string, kind: MarkerProblem['kind'], start: number, end: number, message: string, key?: string): MarkerProblem {
  return { kind, start, end, ...positionOf(text, start), message, ...(key ? { key } : {}) };
}

const CITE_START = /(^|[\s\-[;])-?@/;

/** Splits a locator part such as `fol. 12v and passim` into label, locator and suffix. */
export function parseLocator(part: string): { locatorType: LocatorType | null; locator: string | null; suffix: string } {
  let rest = part.trim();
  let locatorType: LocatorType | null = null;
  for (const [pattern, type] of LABELS) {
    const match = pattern.exec(rest);
    if (match) {
      locatorType = type;
      rest = rest.slice(match[0].length);
      break;
    }
  }
  const match = /^([0-9A-Za-z*†¶§]+(?:\s*[-–]\s*[0-9A-Za-z*†¶§]+)?(?:\s*,\s*[0-9]+[rvab]?)*)(.*)$/.exec(rest);
  if (!match || !/\d|^[ivxlcdm]+$/i.test(match[1])) return { locatorType, locator: null, suffix: rest };
  return { locatorType, locator: match[1].replace(/\s*[-–]\s*/, '–'), suffix: match[2].trim() };
}

function parseItem(text: string): MarkerItem | string {
  const match = /^([\s\S]*?)(^|\s|-)(-?)@([A-Za-z0-9_][\w:.#$%&+?<>~/-]*)?([\s\S]*)$/.exec(text);
  if (!match) return 'Each item needs an @id, e.g. [@E1234567, fol. 12v].';
  const [, before, lead, dash, rawKey, after] = match;
  if (!rawKey) return 'An @ must be followed by an excerpt or source id, e.g. @E1234567.';
  const key = rawKey.replace(/[.:]+$/, '');
  const trailing = rawKey.slice(key.length) + after;
  if (/(^|\s|-)-?@/.test(trailing)) return 'Separate several citations with a semicolon: [@E1; @E2].';
  const item: MarkerItem = { key, prefix: (before + (lead === '-' ? '' : lead)).trim(), locator: null, locatorType: null, suffix: '', suppressAuthor: dash === '-' };
  const tail = trailing.trim();
  if (tail.startsWith(',')) {
    const locator = parseLocator(tail.slice(1));
    Object.assign(item, locator);
    if (!locator.locator && !locator.locatorType) item.suffix = tail.slice(1).trim();
    else if (!locator.locator) return `The locator after ${key} is missing its number, e.g. fol. 12v.`;
  } else if (tail) {
    item.suffix = tail;
  }
  return item;
}

export function parseMarkers(text: string): ParsedMarkers {
  const markers: Marker[] = [];
  const problems: MarkerProblem[] = [];
  let i = 0;
  while (i < text.length) {
    const open = text.indexOf('[', i);
    if (open < 0) break;
    if (text[open - 1] === '\\' || text[open - 1] === '!') {
      i = open + 1;
      continue;
    }
    // The bracket's content runs to the first `]` before a blank line (a paragraph end).
    const paragraphEnd = text.slice(open).search(/\n\s*\n/);
    const limit = paragraphEnd < 0 ? text.length : open + paragraphEnd;
    const nextOpen = text.indexOf('[', open + 1);
    const close = text.indexOf(']', open + 1);
    const content = text.slice(open + 1, close >= 0 && close < limit ? close : limit);
    const looksLikeCitation = CITE_START.test(content);
    if (close < 0 || close >= limit || (nextOpen >= 0 && nextOpen < close && looksLikeCitation)) {
      if (looksLikeCitation) {
        const end = nextOpen >= 0 && nextOpen < limit ? nextOpen : limit;
        problems.push(problem(text, 'malformed', open, end, 'This citation is missing its closing bracket ].'));
      }
      i = open + 1;
      continue;
    }
    // A Markdown link `[text](url)` or reference `[text][ref]` is not a citation.
    if (!looksLikeCitation || text[close + 1] === '(' || (text[close + 1] === '[' && !CITE_START.test(content))) {
      i = open + 1;
      continue;
    }
    const raw = text.slice(open, close + 1);
    const parts = content.split(';');
    const items: MarkerItem[] = [];
    let error: string | null = null;
    for (const part of parts) {
      const parsed = parseItem(part);
      if (typeof parsed === 'string') {
        error = parsed;
        break;
      }
      items.push(parsed);
    }
    if (error) problems.push(problem(text, 'malformed', open, close + 1, error));
    else markers.push({ start: open, end: close + 1, raw, items });
    i = close + 1;
  }
  for (const marker of markers) {
    for (const item of marker.items) {
      if (!WINDWAY_ID.test(item.key)) {
        problems.push(problem(text, 'unknown-id', marker.start, marker.end, `"${item.key}" is not a Windway id (E… for an excerpt, S… for a source).`, item.key));
      }
    }
  }
  problems.sort((a, b) => a.start - b.start);
  return { markers, problems };
}

/** Problems for well-formed ids that are not in `known` (not found, or not public). */
export function checkIds(text: string, parsed: ParsedMarkers, known: ReadonlySet<string>): MarkerProblem[] {
  const problems: MarkerProblem[] = [];
  for (const marker of parsed.markers) {
    for (const item of marker.items) {
      if (WINDWAY_ID.test(item.key) && !known.has(item.key)) {
        problems.push(problem(text, 'unknown-id', marker.start, marker.end, `${item.key} was not found, or is not public yet.`, item.key));
      }
    }
  }
  return problems;
}

/** Every distinct key, in order of first use. */
export function citedKeys(parsed: ParsedMarkers): string[] {
  return [...new Set(parsed.markers.flatMap((m) => m.items.map((i) => i.key)))];
}

/** The marker `[@id, fol. 12v]` for an id and optional formatted locator (what "Add to programme" inserts). */
export function markerFor(id: string, locator?: string | null): string {
  return locator ? `[@${id}, ${locator}]` : `[@${id}]`;
}
