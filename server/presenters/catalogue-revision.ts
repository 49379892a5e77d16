import type { Revision } from '../models';
import type { RevisionDetail, RevisionSummary } from '@shared/catalogue/types';

export function presentRevisionSummary(revision: Revision): RevisionSummary {
  return {
    version: revision.version,
    authorId: revision.authorId,
    author: revision.author ? { displayName: revision.author.displayName } : null,
    reason: revision.reason,
    createdAt: revision.createdAt.toISOString(),
  };
}

export function presentRevisionDetail(revision: Revision): RevisionDetail {
  return { ...presentRevisionSummary(revision), snapshot: revision.snapshot };
}
