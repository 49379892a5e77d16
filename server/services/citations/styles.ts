/**
 * CSL styles from Debian's citation-style-language-styles (config.CSL_STYLES_DIR), never copied
 * into the repository. Windway's two names are registered first; every other independent style
 * in the folder is offered by its id (file name without `.csl`, which is also the last part of
 * the style's `<id>`), registered with citation-js the first time it is used. Dependent styles
 * (the `dependent/` sub-folder) are left out: they only point at a parent style.
 */
import { closeSync, existsSync, openSync, readFileSync, readSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { plugins } from '@citation-js/core';
import '@citation-js/plugin-csl';
import type { CitationStyle, StyleKind } from '@shared/citations/api';
import { getConfig } from '../../config';
import { badRequest, unavailable } from '../../errors';

/**
 * `notes` is the full-note variant of Chicago 17 notes-bibliography: the first note on an item is
 * the full note and later ones are short (CMOS 17 §14.20–14.30), as music historians write them.
 * (`chicago-note-bibliography.csl` is the short-notes-only variant, still offered by its id.)
 */
export const WINDWAY_STYLES: Record<string, { file: string; title: string }> = {
  notes: { file: 'chicago-fullnote-bibliography.csl', title: 'Notes and bibliography (Chicago Manual of Style, 17th ed., full notes)' },
  'author-date': { file: 'chicago-author-date.csl', title: 'Author-date (Chicago Manual of Style, 17th ed.)' },
};

interface StyleEntry extends CitationStyle {
  file: string;
}

let catalogue: { dir: string; styles: Map<string, StyleEntry>; list: CitationStyle[]; listJson: string } | undefined;
const registered = new Set<string>();

function stylesDir(): string {
  const dir = getConfig().CSL_STYLES_DIR;
  if (catalogue?.dir === dir) return dir;
  if (!existsSync(dir)) throw unavailable(`The CSL styles folder ${dir} is missing: install the Debian package citation-style-language-styles.`);
  return dir;
}

/** Title, class and dependency of a style from its first few kilobytes (the `<info>` block comes first). */
export function readStyleHeader(path: string): { title: string; kind: StyleKind; dependent: boolean } | null {
  const fd = openSync(path, 'r');
  try {
    const buffer = Buffer.alloc(6144);
    const length = readSync(fd, buffer, 0, buffer.length, 0);
    const head = buffer.subarray(0, length).toString('utf8');
    const title = /<title>([^<]*)<\/title>/.exec(head)?.[1];
    const kind = /<style[^>]*\bclass="(note|in-text)"/.exec(head)?.[1] as StyleKind | undefined;
    if (!title || !kind) return null;
    return { title: decodeEntities(title.trim()), kind, dependent: /rel="independent-parent"/.test(head) };
  } finally {
    closeSync(fd);
  }
}

function decodeEntities(text: string): string {
  return text.replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'");
}

/** Reads the folder once (headers only) and caches the list. */
function styleCatalogue() {
  const dir = stylesDir();
  if (catalogue?.dir === dir) return catalogue;
  const styles = new Map<string, StyleEntry>();
  for (const [id, { file, title }] of Object.entries(WINDWAY_STYLES)) {
    const header = existsSync(join(dir, file)) ? readStyleHeader(join(dir, file)) : null;
    if (header) styles.set(id, { id, title, kind: header.kind, file });
  }
  const others: StyleEntry[] = [];
  for (const name of readdirSync(dir)) {
    if (!name.endsWith('.csl')) continue;
    const id = name.slice(0, -4);
    if (styles.has(id)) continue;
    const header = readStyleHeader(join(dir, name));
    if (header && !header.dependent) others.push({ id, title: header.title, kind: header.kind, file: name });
  }
  others.sort((a, b) => a.title.localeCompare(b.title, 'en'));
  for (const entry of others) styles.set(entry.id, entry);
  const list = [...styles.values()].map(({ id, title, kind }) => ({ id, title, kind }));
  // Debian ships thousands of styles: the response body is built once, not per request.
  catalogue = { dir, styles, list, listJson: JSON.stringify({ data: list }) };
  return catalogue;
}

export function listStyles(): CitationStyle[] {
  return styleCatalogue().list;
}

/** `{ data: listStyles() }` as JSON text. */
export function listStylesJson(): string {
  return styleCatalogue().listJson;
}

/**
 * The citation-js template name for a style id, registering it on first use. An unknown id is a
 * 400: citation-js would silently format in APA instead.
 */
export function useStyle(id: string, field = 'style'): StyleEntry {
  const entry = styleCatalogue().styles.get(id);
  if (!entry) throw badRequest(`Unknown citation style "${id}": choose one from GET /api/cite/styles.`, { [field]: `Unknown style "${id}".` });
  if (!registered.has(id)) {
    const xml = readFileSync(join(catalogue!.dir, entry.file), 'utf8');
    plugins.config.get('@csl').templates.add(id, xml);
    registered.add(id);
  }
  return entry;
}

/** Registers Windway's two default styles at start; a missing folder is logged, then reported per request. */
export function registerDefaultStyles(log: (message: string) => void = console.error): void {
  try {
    for (const id of Object.keys(WINDWAY_STYLES)) useStyle(id);
  } catch (error) {
    log(`[citations] ${(error as Error).message}`);
  }
}
