import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db';
import { Excerpt, Review, Source, User } from '../../models';
import { presentExcerptRow, presentSourceRow } from '../../presenters/review';
import { workflowStates } from '@shared/catalogue/vocabulary';
import type { ReviewQueueQuery } from '@shared/review/schemas';
import type { EntityKind, QueueResponse, QueueRow, StateCounts } from '@shared/review/types';

const contributorInclude = { model: User, as: 'contributor', attributes: ['id', 'displayName'] };

async function stateCounts(): Promise<StateCounts> {
  const counts = {} as StateCounts;
  for (const [kind, table] of [['source', 'sources'], ['excerpt', 'excerpts']] as const) {
    counts[kind] = Object.fromEntries(workflowStates.map((s) => [s, 0])) as StateCounts[EntityKind];
    const rows = await getSequelize().query<{ status: string; n: number }>(`SELECT status, COUNT(*) AS n FROM ${table} GROUP BY status`, { type: QueryTypes.SELECT });
    for (const row of rows) counts[kind][row.status as keyof StateCounts[EntityKind]] = Number(row.n);
  }
  return counts;
}

/** Ids of items that were decided on before: what comes back is a resubmission. */
async function reviewedIds(kind: EntityKind, ids: number[]): Promise<Set<number>> {
  if (!ids.length) return new Set();
  const rows = await Review.findAll({ where: { entityType: kind, entityId: ids }, attributes: ['entityId'] });
  return new Set(rows.map((r) => r.entityId));
}

function matchesContributor(row: QueueRow, filter: string | undefined): boolean {
  if (!filter) return true;
  if (/^\d+$/.test(filter)) return row.contributor?.id === Number(filter);
  return !!row.contributor && row.contributor.displayName.toLowerCase().includes(filter.toLowerCase());
}

/**
 * The review queue: sources and excerpts awaiting review, filtered and paged, oldest
 * first by default, with counts of every state. The queue is small (only what awaits
 * review), so filtering happens after one query per kind.
 */
export async function loadQueue(query: ReviewQueueQuery): Promise<QueueResponse> {
  const rows: QueueRow[] = [];
  if (query.kind !== 'excerpt') {
    const sources = await Source.findAll({ where: { status: 'submitted', ...(query.sourceType ? { sourceType: query.sourceType } : {}) }, include: [contributorInclude] });
    const waiting = await Excerpt.findAll({ where: { status: 'submitted', sourceId: sources.map((s) => s.id) }, attributes: ['sourceId'] });
    const reviewed = await reviewedIds('source', sources.map((s) => s.id));
    for (const source of sources) {
      rows.push(presentSourceRow(source, waiting.filter((e) => e.sourceId === source.id).length, reviewed.has(source.id)));
    }
  }
  if (query.kind !== 'source') {
    const excerpts = await Excerpt.findAll({
      where: { status: 'submitted' },
      include: [contributorInclude, { model: Source, as: 'source', where: query.sourceType ? { sourceType: query.sourceType } : undefined }],
    });
    const reviewed = await reviewedIds('excerpt', excerpts.map((e) => e.id));
    for (const excerpt of excerpts) rows.push(presentExcerptRow(excerpt, excerpt.source!, reviewed.has(excerpt.id)));
  }
  const filtered = rows.filter(
    (row) =>
      matchesContributor(row, query.contributor) &&
      (query.minAgeDays === undefined || row.ageDays >= query.minAgeDays) &&
      (query.maxAgeDays === undefined || row.ageDays <= query.maxAgeDays) &&
      (!query.lang || row.languages.includes(query.lang)),
  );
  const direction = query.sort === 'newest' ? -1 : 1;
  filtered.sort((a, b) => direction * (a.waitingSince.localeCompare(b.waitingSince) || a.id.localeCompare(b.id)));
  const start = (query.page - 1) * query.perPage;
  return { data: filtered.slice(start, start + query.perPage), total: filtered.length, page: query.page, perPage: query.perPage, counts: await stateCounts() };
}
