import type { Transaction } from 'sequelize';
import { getSequelize } from '../db';
import { Excerpt, InstrumentMention, PitchTag, Review, type Source } from '../models';
import { conflict, forbidden, invalid } from '../errors';
import { notifyContributorOfDecision } from '../services/notifications';
import { lockExcerpt, lockSource, recordExcerptVersion, recordSourceVersion } from './support';
import { ownWorkMessage, reviewPolicy } from '../policies/review';
import type { SessionUser } from '../auth/passport';
import { decisionNeedsComment, stateLabels, transition } from '@shared/catalogue/workflow';
import { isContentField } from '@shared/review/fields';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import type { Decision } from '@shared/review/schemas';
import type { EntityKind } from '@shared/review/types';

export type Target = { kind: 'source'; item: Source; source: Source } | { kind: 'excerpt'; item: Excerpt; source: Source };

/** Loads a source or excerpt by public id and locks its row for the transaction (excerpts with their tags). */
export async function lockTarget(kind: EntityKind, publicId: string, transaction: Transaction): Promise<Target> {
  if (kind === 'source') {
    const source = await lockSource(publicId, transaction);
    return { kind, item: source, source };
  }
  const { excerpt, source } = await lockExcerpt(publicId, transaction);
  await loadExcerptChildren(excerpt, transaction);
  return { kind, item: excerpt, source };
}

export async function loadExcerptChildren(excerpt: Excerpt, transaction?: Transaction): Promise<void> {
  const where = { excerptId: excerpt.id };
  excerpt.mentions = await InstrumentMention.findAll({ where, order: [['position', 'ASC']], transaction });
  excerpt.pitchTags = await PitchTag.findAll({ where, order: [['position', 'ASC']], transaction });
}

/**
 * Saves `changes` as the next version of the item: the row, its Revision (full snapshot,
 * through the catalogue's own recorders) and the search outbox row, in the caller's transaction.
 */
export async function writeNextVersion(
  target: Target,
  changes: Record<string, unknown>,
  authorId: number,
  reason: string | null,
  transaction: Transaction,
): Promise<number> {
  const { item } = target;
  const version = item.version + 1;
  (item as Source).set({ ...changes, version } as Partial<Source>);
  await item.save({ transaction });
  const why = reason?.slice(0, 500) ?? null;
  if (target.kind === 'source') await recordSourceVersion(target.item, authorId, why, transaction);
  else await recordExcerptVersion(target.item, target.source.publicId, authorId, why, transaction);
  return version;
}

const reasons = { approve: 'Approved', return: 'Returned for changes', reject: 'Rejected' } as const;

/** Checks that need no database: a comment for return/reject, known field names. */
export function checkDecisionInput(input: Decision): void {
  if (decisionNeedsComment(input.decision) && !input.comment) {
    throw invalid({ comment: `Say what to change: a comment is required to ${input.decision} a submission.` }, `A comment is required to ${input.decision}.`);
  }
  const fields: Record<string, string> = {};
  input.fieldComments.forEach((c, i) => {
    if (!isContentField(input.target.kind, c.field)) fields[`fieldComments.${i}.field`] = `“${c.field}” is not a field of a ${input.target.kind}.`;
  });
  if (Object.keys(fields).length) throw invalid(fields);
}

export interface DecisionResult {
  review: Review;
  target: Target;
  /** Excerpts approved together with their source. */
  alsoApproved: Excerpt[];
}

/**
 * An editor's decision, in one transaction: the Review row, the state change (and
 * approved version) as a new version with its Revision, and the search outbox row.
 * Approving a source also approves its excerpts awaiting review (not those returned,
 * and not those the deciding editor contributed). The contributor is mailed after commit.
 */
export async function decideReview(actor: SessionUser, input: Decision): Promise<DecisionResult> {
  checkDecisionInput(input);
  const { kind, id, version } = input.target;
  const result = await getSequelize().transaction(async (transaction) => {
    const target = await lockTarget(kind, id, transaction);
    const { item, source } = target;
    if (!reviewPolicy.decideOn(actor, item, kind === 'excerpt' ? source : undefined)) throw forbidden(ownWorkMessage(kind));
    const next = transition(item.status, input.decision);
    if (!next) {
      throw conflict(`Cannot ${input.decision} this ${kind}: it is “${stateLabels[item.status as WorkflowState]}” (${item.status}), and only a submission awaiting review can be decided.`);
    }
    if (item.version !== version) {
      throw conflict(`This ${kind} changed since you opened it: you reviewed version ${version}, the current one is ${item.version}. Reload and review the current version.`);
    }
    const review = await Review.create(
      { entityType: kind, entityId: item.id, version, editorId: actor.id, decision: input.decision, comment: input.comment ?? null, fieldComments: input.fieldComments },
      { transaction },
    );
    const approve = input.decision === 'approve';
    const reason = `${reasons[input.decision]} by ${actor.displayName}${input.comment ? `: ${input.comment}` : ''}`;
    await writeNextVersion(target, { status: next, ...(approve ? { approvedVersion: item.version + 1 } : {}) }, actor.id, reason, transaction);

    const alsoApproved: Excerpt[] = [];
    if (approve && kind === 'source') {
      const waiting = await Excerpt.findAll({ where: { sourceId: item.id, status: 'submitted' }, lock: transaction.LOCK.UPDATE, transaction });
      for (const excerpt of waiting) {
        if (excerpt.contributorId === actor.id) continue;
        await loadExcerptChildren(excerpt, transaction);
        await Review.create(
          { entityType: 'excerpt', entityId: excerpt.id, version: excerpt.version, editorId: actor.id, decision: 'approve', comment: 'Approved with its source.', fieldComments: [] },
          { transaction },
        );
        await writeNextVersion({ kind: 'excerpt', item: excerpt, source: item as Source }, { status: 'approved', approvedVersion: excerpt.version + 1 }, actor.id, `Approved with its source by ${actor.displayName}`, transaction);
        alsoApproved.push(excerpt);
      }
    }
    return { review, target, alsoApproved };
  });
  await notifyContributorOfDecision(result.target.item, {
    decision: input.decision,
    comment: input.comment ?? null,
    fieldComments: input.fieldComments,
    alsoApproved: result.alsoApproved.length,
  });
  return result;
}
