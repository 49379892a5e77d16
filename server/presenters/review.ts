import type { Excerpt, Review, Source, User } from '../models';
import type { MySubmission, QueueRow, ReviewRecord } from '@shared/review/types';
import { formatLocator } from '@shared/catalogue/locator';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { stateLabels } from '@shared/catalogue/workflow';
import { presentCredit } from './user';

export function presentReview(review: Review): ReviewRecord {
  return {
    id: review.id,
    kind: review.entityType,
    version: review.version,
    decision: review.decision,
    comment: review.comment,
    fieldComments: (review.fieldComments ?? []).map((c) => ({ field: c.field, comment: c.comment })),
    editor: presentCredit(review.editor),
    createdAt: review.createdAt.toISOString(),
  };
}

const DAY = 86_400_000;
export const ageInDays = (since: Date, now = Date.now()) => Math.max(0, Math.floor((now - since.getTime()) / DAY));

export const excerptTitle = (excerpt: Pick<Excerpt, 'locatorType' | 'locatorValue'>, source: Pick<Source, 'title'>) =>
  `${source.title}, ${formatLocator(excerpt.locatorType, excerpt.locatorValue)}`;

/** When a source started waiting: its submit time, or its last change. */
export const waitingSince = (item: Source | Excerpt) => ('submittedAt' in item && item.submittedAt ? item.submittedAt : item.updatedAt);

export function presentSourceRow(source: Source & { contributor?: User }, submittedExcerpts: number, resubmitted: boolean): QueueRow {
  const since = waitingSince(source);
  return {
    kind: 'source',
    id: source.publicId,
    title: source.title,
    locator: null,
    source: { id: source.publicId, title: source.title, sourceType: source.sourceType },
    languages: [...source.languages],
    contributor: presentCredit(source.contributor),
    version: source.version,
    status: source.status,
    waitingSince: since.toISOString(),
    ageDays: ageInDays(since),
    submittedExcerpts,
    resubmitted,
  };
}

export function presentExcerptRow(excerpt: Excerpt & { contributor?: User }, source: Source, resubmitted: boolean): QueueRow {
  const since = excerpt.updatedAt;
  return {
    kind: 'excerpt',
    id: excerpt.publicId,
    title: excerptTitle(excerpt, source),
    locator: formatLocator(excerpt.locatorType, excerpt.locatorValue),
    source: { id: source.publicId, title: source.title, sourceType: source.sourceType },
    languages: [...source.languages],
    contributor: presentCredit(excerpt.contributor),
    version: excerpt.version,
    status: excerpt.status,
    waitingSince: since.toISOString(),
    ageDays: ageInDays(since),
    submittedExcerpts: null,
    resubmitted,
  };
}

export function presentSubmission(
  kind: 'source' | 'excerpt',
  item: Source | Excerpt,
  source: Source,
  lastReview: Review | undefined,
): MySubmission {
  return {
    kind,
    id: item.publicId,
    title: kind === 'source' ? source.title : excerptTitle(item as Excerpt, source),
    source: { id: source.publicId, title: source.title },
    status: item.status,
    statusLabel: stateLabels[item.status as WorkflowState],
    version: item.version,
    updatedAt: item.updatedAt.toISOString(),
    lastReview: lastReview ? presentReview(lastReview) : null,
  };
}
