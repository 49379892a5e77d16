/** Bulk loading of the benchmark corpus: multi-row INSERTs in chunks, one transaction per chunk. */
import type { Sequelize } from 'sequelize';
import { Corpus, type ExcerptRow, type MentionRow, type PitchRow, type SourceRow } from './corpus';

type Row = Record<string, unknown>;

async function insertRows(sequelize: Sequelize, table: string, columns: string[], rows: Row[], chunk = 1000): Promise<void> {
  const now = new Date().toISOString().slice(0, 19).replace('T', ' ');
  const cols = [...columns, 'created_at', 'updated_at'];
  for (let i = 0; i < rows.length; i += chunk) {
    const values = rows
      .slice(i, i + chunk)
      .map((r) => `(${[...columns.map((c) => (r[c] === null || r[c] === undefined ? 'NULL' : sequelize.escape(r[c] as string | number))), `'${now}'`, `'${now}'`].join(',')})`)
      .join(',');
    await sequelize.query(`INSERT INTO ${table} (${cols.join(',')}) VALUES ${values}`);
  }
}

const snake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const asRows = <T extends object>(list: T[], keys: (keyof T)[]) =>
  list.map((r) => Object.fromEntries(keys.map((k) => [snake(String(k)), r[k]])));

export interface LoadStats {
  sources: number;
  excerpts: number;
  mentions: number;
  pitchTags: number;
  distinctTexts: number;
  generateMs: number;
  insertMs: number;
}

/** Generates and inserts `size` excerpts over `size / 20` sources; returns counts and timings. */
export async function loadCorpus(sequelize: Sequelize, corpus: Corpus, size: number, contributorId: number, log: (l: string) => void): Promise<LoadStats> {
  const sourceCount = Math.max(1, Math.round(size / 20));
  let generateMs = 0;
  let insertMs = 0;
  let t = performance.now();
  const sources: (SourceRow & { contributorId: number })[] = [];
  for (let i = 1; i <= sourceCount; i++) sources.push(corpus.source(i, contributorId));
  generateMs += performance.now() - t;
  t = performance.now();
  const sourceKeys = ['id', 'publicId', 'title', 'sourceType', 'creators', 'dateEdtf', 'dateEarliest', 'dateLatest', 'dateLabel', 'place', 'languages', 'status', 'contributorId'] as const;
  await insertRows(sequelize, 'sources', sourceKeys.map(snake).concat('approved_version'), asRows(sources, [...sourceKeys]).map((r, i) => ({ ...r, approved_version: sources[i].status === 'approved' ? 1 : null })));
  insertMs += performance.now() - t;

  const excerptKeys = ['id', 'publicId', 'sourceId', 'locatorValue', 'diplomatic', 'normalised', 'translation', 'commentary', 'dateEdtf', 'dateEarliest', 'dateLatest', 'dateLabel', 'status'] as const;
  let mentionCount = 0;
  let pitchCount = 0;
  const step = 5000;
  for (let start = 1; start <= size; start += step) {
    t = performance.now();
    const excerpts: ExcerptRow[] = [];
    const mentions: MentionRow[] = [];
    const pitch: PitchRow[] = [];
    for (let id = start; id < Math.min(size + 1, start + step); id++) {
      // Sources get excerpts unevenly: a few long treatises, many short records.
      const source = sources[Math.floor(Math.pow(corpus.rand(), 1.6) * sources.length)];
      const made = corpus.excerpt(id, source);
      excerpts.push(made.excerpt);
      mentions.push(...made.mentions);
      pitch.push(...made.pitch);
    }
    generateMs += performance.now() - t;
    t = performance.now();
    const rows = asRows(excerpts, [...excerptKeys]).map((r, i) => ({
      ...r, locator_type: 'folio', topics: '[]', contributor_id: contributorId, approved_version: excerpts[i].status === 'approved' ? 1 : null,
    }));
    await insertRows(sequelize, 'excerpts', [...excerptKeys.map(snake), 'locator_type', 'topics', 'contributor_id', 'approved_version'], rows, 500);
    await insertRows(sequelize, 'instrument_mentions', ['excerpt_id', 'term', 'language', 'size_slug', 'position', 'certainty'],
      asRows(mentions, ['excerptId', 'term', 'language', 'sizeSlug', 'position']).map((r) => ({ ...r, certainty: 'certain' })), 2000);
    await insertRows(sequelize, 'pitch_tags', ['excerpt_id', 'a_hz', 'cents_from_440', 'position', 'statement', 'derivation'],
      pitch.map((p) => ({ excerpt_id: p.excerptId, a_hz: p.aHz, cents_from_440: p.cents, position: p.position, statement: `a′ = ${p.aHz}`, derivation: 'stated' })), 2000);
    insertMs += performance.now() - t;
    mentionCount += mentions.length;
    pitchCount += pitch.length;
    log(`loaded ${Math.min(size, start + step - 1)}/${size} excerpts`);
  }
  return { sources: sourceCount, excerpts: size, mentions: mentionCount, pitchTags: pitchCount, distinctTexts: corpus.textHashes.size, generateMs, insertMs };
}
