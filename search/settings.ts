/**
 * Settings of the `excerpts` index, and the concordance synonyms. Applied by the
 * re-index and by `ensureIndex()` before the outbox worker first writes.
 */
import type { Meilisearch } from 'meilisearch';
import { QueryTypes } from 'sequelize';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { MAX_RESULT_WINDOW } from '@shared/search/schema';
import { getSequelize } from '@server/db';
import { getSearchClient, indexUid } from './client';

export const EXCERPTS = 'excerpts';

/**
 * Waits for a task and throws unless it succeeded (the client returns failed tasks
 * without throwing). `tolerated` error codes count as success.
 */
export async function waitForTask(client: Meilisearch, taskUid: number, what: string, tolerated: string[] = []): Promise<void> {
  const task = await client.tasks.waitForTask(taskUid, { timeout: 60_000, interval: 25 });
  if (task.status === 'succeeded') return;
  if (task.error && tolerated.includes(task.error.code)) return;
  throw new Error(`Search ${what} ${task.status}: ${task.error?.message ?? 'no reason given'}`);
}
export const excerptsUid = () => indexUid(EXCERPTS);

/** Ranking order: the transcription first, then what editors and contributors added around it. */
export const searchableAttributes = [
  'diplomatic',
  'normalised',
  'translation',
  'terms',
  'sizeNames',
  'sourceTitle',
  'commentary',
  'creators',
  'place',
];

export const filterableAttributes = [
  'sizes', 'families', 'sourceType', 'languages', 'yearEarliest', 'yearLatest', 'decades', 'aHz',
  'status', 'visibility', 'contributorId', 'ownerIds', 'sourceId', 'sourceRowId', 'rowId', 'place',
];

export const sortableAttributes = ['yearEarliest', 'yearLatest', 'sourceTitle'];

/**
 * Our own short lists of function words per language: only words that never carry
 * meaning in a passage about instruments (no numerals, no note names such as "la").
 */
export const stopWords: Record<string, string[]> = {
  en: ['the', 'a', 'an', 'and', 'of', 'to', 'in', 'is', 'it', 'that', 'with', 'for', 'on', 'as', 'by', 'be', 'this', 'which', 'are', 'was'],
  fr: ['le', 'les', 'des', 'du', 'un', 'une', 'et', 'en', 'au', 'aux', 'que', 'qui', 'pour', 'par', 'sur', 'dans', 'est', 'se', 'ce', 'il'],
  de: ['der', 'die', 'das', 'und', 'den', 'dem', 'des', 'ein', 'eine', 'einer', 'zu', 'mit', 'von', 'ist', 'im', 'auf', 'sich', 'auch', 'wie', 'so'],
  nl: ['het', 'een', 'en', 'van', 'te', 'met', 'op', 'voor', 'dat', 'die', 'ende', 'ofte', 'zijn', 'wordt'],
  it: ['il', 'lo', 'gli', 'di', 'del', 'della', 'delle', 'dei', 'e', 'che', 'per', 'con', 'da', 'nel', 'nella', 'si', 'una', 'uno'],
  la: ['et', 'est', 'ad', 'cum', 'quod', 'qui', 'quae', 'ut', 'sed', 'ex', 'per', 'atque', 'ac', 'enim', 'vel', 'sunt'],
};

/** Words a typo must never reach: short sizes whose one-letter neighbours are other sizes. */
const noTypoWords = ['alto', 'bass', 'tenor', 'basse', 'basso'];

export function excerptsSettings() {
  return {
    searchableAttributes,
    filterableAttributes,
    sortableAttributes,
    displayedAttributes: ['*'],
    stopWords: [...new Set(Object.values(stopWords).flat())],
    typoTolerance: {
      enabled: true,
      minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 },
      disableOnWords: noTypoWords,
      // Ids, places and creators' names are looked up exactly.
      disableOnAttributes: ['creators', 'place'],
    },
    faceting: { maxValuesPerFacet: 100 },
    pagination: { maxTotalHits: MAX_RESULT_WINDOW },
  };
}

/** The names a size goes by: its name, its slug in words and its other names. */
export function namesOfSize(slug: string): string[] {
  const size = INSTRUMENT_SIZES.find((s) => s.slug === slug);
  if (!size) return [slug.replace(/-/g, ' ')];
  return [size.name, slug.replace(/-/g, ' '), ...size.otherNames];
}

const fold = (s: string) => s.normalize('NFKD').replace(/\p{M}+/gu, '').toLowerCase().replace(/\s+/g, ' ').trim();

/** A term as written that points at more sizes than this is too vague to stand for any one. */
const MAX_SIZES_PER_TERM = 2;

/**
 * Synonyms from the concordance: every term as written in an instrument mention, and
 * every other name of a size, reaches the size's name (which each document carries
 * in `sizeNames`), so "flûte douce" or "treble" finds alto passages. Terms used for
 * more than two sizes (a bare "flute") are left alone.
 */
export async function computeSynonyms(): Promise<Record<string, string[]>> {
  const rows = await getSequelize().query<{ term: string; size_slug: string }>(
    'SELECT DISTINCT term, size_slug FROM instrument_mentions',
    { type: QueryTypes.SELECT },
  );
  const sizesByTerm = new Map<string, { term: string; slugs: Set<string> }>();
  const add = (term: string, slug: string) => {
    const key = fold(term);
    if (!key) return;
    const entry = sizesByTerm.get(key) ?? { term: term.trim(), slugs: new Set<string>() };
    entry.slugs.add(slug);
    sizesByTerm.set(key, entry);
  };
  for (const size of INSTRUMENT_SIZES) for (const name of size.otherNames) add(name, size.slug);
  for (const row of rows) add(row.term, row.size_slug);

  const synonyms: Record<string, string[]> = {};
  for (const [key, { term, slugs }] of [...sizesByTerm].sort(([a], [b]) => a.localeCompare(b))) {
    if (slugs.size > MAX_SIZES_PER_TERM) continue;
    const targets = [...slugs].map((slug) => INSTRUMENT_SIZES.find((s) => s.slug === slug)?.name ?? slug.replace(/-/g, ' '));
    const wanted = targets.filter((t) => fold(t) !== key);
    if (wanted.length) synonyms[term] = wanted;
  }
  return synonyms;
}

/** Applies all settings of the excerpts index (creating it if needed) and waits. */
export async function applySettings(client: Meilisearch, synonyms?: Record<string, string[]>): Promise<void> {
  const task = await client.index(excerptsUid()).updateSettings({ ...excerptsSettings(), synonyms: synonyms ?? (await computeSynonyms()) });
  await waitForTask(client, task.taskUid, 'updating the index settings');
}

let ensured: { uid: string; at: number } | null = null;
const RECHECK_MS = 30_000;

/**
 * Makes sure the index exists with its settings (checked at most every 30 s per
 * process); true when it had to create it, so the caller knows to fill it.
 */
export async function ensureIndex(client: Meilisearch): Promise<boolean> {
  const uid = excerptsUid();
  if (ensured?.uid === uid && Date.now() - ensured.at < RECHECK_MS) return false;
  let created = false;
  try {
    const index = await client.getIndex(uid);
    // null: a settings update created the index first (Meilisearch does that); it is empty,
    // and every add of documents names `id`, which then becomes its primary key.
    if (index.primaryKey !== 'id' && index.primaryKey !== null) throw new Error(`Index ${uid} has primary key ${index.primaryKey}, expected id`);
  } catch (error) {
    if ((error as { cause?: { code?: string } }).cause?.code !== 'index_not_found') throw error;
    const task = await client.createIndex(uid, { primaryKey: 'id' });
    await waitForTask(client, task.taskUid, 'creating the index', ['index_already_exists']);
    await applySettings(client);
    created = true;
  }
  ensured = { uid, at: Date.now() };
  return created;
}

export function forgetEnsuredIndex(): void {
  ensured = null;
}

/**
 * Recomputes the concordance synonyms and pushes them; call after the concordance
 * changes (the review/concordance work does) and after a re-index.
 */
export async function refreshSynonyms(): Promise<Record<string, string[]> | null> {
  const client = getSearchClient();
  if (!client) return null;
  const synonyms = await computeSynonyms();
  const task = await client.index(excerptsUid()).updateSynonyms(synonyms);
  await waitForTask(client, task.taskUid, 'updating the synonyms');
  return synonyms;
}
