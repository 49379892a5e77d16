import { QueryTypes } from 'sequelize';
import { getSequelize } from '../db';
import { InstrumentSizeRecord } from '../models';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { certainties, type Certainty } from '@shared/catalogue/vocabulary';
import type { ConcordanceEntry, ConcordanceSize } from '@shared/review/types';

interface MentionRow {
  term: string;
  language: string;
  size_slug: string;
  certainty: Certainty;
  excerpt_id: number;
  public_id: string;
}

/** Size slug → name, from the editors' vocabulary, falling back to the built-in list. */
export async function sizeNames(): Promise<Map<string, string>> {
  const names = new Map(INSTRUMENT_SIZES.map((s) => [s.slug, s.name]));
  for (const record of await InstrumentSizeRecord.findAll({ attributes: ['slug', 'name'] })) names.set(record.slug, record.name);
  return names;
}

const emptyCertainty = () => Object.fromEntries(certainties.map((c) => [c, 0])) as Record<Certainty, number>;

/**
 * Historical terms as written (with their language) → the sizes they denote, from
 * approved excerpts of approved sources only: counts of excerpts, certainty, examples.
 */
export async function buildConcordance(): Promise<ConcordanceEntry[]> {
  const rows = await getSequelize().query<MentionRow>(
    `SELECT m.term, m.language, m.size_slug, m.certainty, e.id AS excerpt_id, e.public_id
       FROM instrument_mentions m
       JOIN excerpts e ON e.id = m.excerpt_id
       JOIN sources s ON s.id = e.source_id
      WHERE e.status = 'approved' AND s.status = 'approved'
      ORDER BY e.id`,
    { type: QueryTypes.SELECT },
  );
  const names = await sizeNames();
  const entries = new Map<string, { term: string; language: string; excerpts: Set<number>; sizes: Map<string, ConcordanceSize & { ids: Set<number> }> }>();
  for (const row of rows) {
    const key = `${row.term}\u0000${row.language}`;
    let entry = entries.get(key);
    if (!entry) entries.set(key, (entry = { term: row.term, language: row.language, excerpts: new Set(), sizes: new Map() }));
    entry.excerpts.add(row.excerpt_id);
    let size = entry.sizes.get(row.size_slug);
    if (!size) {
      size = { sizeSlug: row.size_slug, sizeName: names.get(row.size_slug) ?? row.size_slug, excerpts: 0, certainty: emptyCertainty(), examples: [], ids: new Set() };
      entry.sizes.set(row.size_slug, size);
    }
    size.certainty[row.certainty] += 1;
    if (!size.ids.has(row.excerpt_id)) {
      size.ids.add(row.excerpt_id);
      size.excerpts += 1;
      if (size.examples.length < 3) size.examples.push(row.public_id);
    }
  }
  const collator = new Intl.Collator('en', { sensitivity: 'base' });
  return [...entries.values()]
    .map((e) => ({
      term: e.term,
      language: e.language,
      excerpts: e.excerpts.size,
      sizes: [...e.sizes.values()].map(({ ids: _ids, ...size }) => size).sort((a, b) => b.excerpts - a.excerpts),
    }))
    .sort((a, b) => collator.compare(a.term, b.term) || a.language.localeCompare(b.language));
}

/**
 * Terms that denote the same size, one group per size: what search synonyms are made of
 * (so “flûte douce”, “flauto dolce” and “Blockflöte” find each other).
 */
export async function synonymGroups(): Promise<{ sizeSlug: string; terms: string[] }[]> {
  const bySize = new Map<string, Set<string>>();
  for (const entry of await buildConcordance()) {
    for (const size of entry.sizes) {
      if (!bySize.has(size.sizeSlug)) bySize.set(size.sizeSlug, new Set());
      bySize.get(size.sizeSlug)!.add(entry.term);
    }
  }
  return [...bySize].map(([sizeSlug, terms]) => ({ sizeSlug, terms: [...terms] }));
}

/**
 * Called after every concordance change has committed. The search engineer registers
 * the synonyms refresh here (`afterConcordanceChange.push(refreshSynonyms)`); a failing
 * hook is logged and never undoes the change.
 */
export const afterConcordanceChange: (() => Promise<void>)[] = [];

export async function runConcordanceHooks(): Promise<void> {
  for (const hook of afterConcordanceChange) {
    try {
      await hook();
    } catch (error) {
      console.error('[concordance] a hook after the change failed:', error);
    }
  }
}
