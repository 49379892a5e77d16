import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import { Excerpt, type Source } from '../models';
import { conflict, HttpError, notFound } from '../errors';
import { authorize } from '../policies';
import { sourcePolicy } from '../policies/source';
import { transition, stateLabels } from '@shared/catalogue/workflow';
import { printedSourceTypes, type WorkflowState } from '@shared/catalogue/vocabulary';
import { lockSource, recordExcerptVersion, recordSourceVersion } from './support';

export interface SubmitSourceResult {
  source: Source;
  /** The excerpts submitted with it (drafts and returned ones). */
  excerpts: Excerpt[];
}

/**
 * Hooks run after a submission commits (e.g. the review workflow's
 * `notifyEditorsOfSubmission`). A failing hook is logged, never undoes the submission.
 */
export const afterSubmit: ((result: SubmitSourceResult, actor: SessionUser) => Promise<void> | void)[] = [];

/** What is missing before a source can go to review, as `{ field: message }` (empty when complete). */
export function missingForSubmission(source: Source, liveExcerpts: number): Record<string, string> {
  const missing: Record<string, string> = {};
  if (!source.rightsStatement) missing.rightsStatement = 'Add a rights statement: who holds the rights in the source and its facsimile, and on what terms it is shown.';
  if (liveExcerpts === 0) missing.excerpts = 'Add at least one excerpt';
  const manuscript = !printedSourceTypes.includes(source.sourceType);
  if (manuscript && source.creators.length === 0) {
    if (!source.holdingInstitution) missing.holdingInstitution = 'Say where the document is held (or name its author, scribe or compiler).';
    if (!source.shelfmark) missing.shelfmark = 'Give the shelfmark (or name its author, scribe or compiler).';
  }
  return missing;
}

/** Submits the source and all its draft or returned excerpts for review, in one transaction. */
export async function submitSource(actor: SessionUser, publicId: string, reason?: string): Promise<SubmitSourceResult> {
  const result = await getSequelize().transaction(async (transaction) => {
    const source = await lockSource(publicId, transaction);
    if (!sourcePolicy.read(actor, source)) throw notFound('The source');
    authorize(actor, sourcePolicy.step(actor, source), 'Only the contributor of this source or an editor may submit it.');

    const next = transition(source.status, 'submit');
    if (!next && source.status !== 'approved') {
      throw conflict(`This source is "${stateLabels[source.status as WorkflowState]}" and cannot be submitted${source.status === 'submitted' ? ' again; wait for the review' : '; reopen it first'}.`, {
        status: `The source is ${source.status}.`,
      });
    }
    const all = await Excerpt.findAll({ where: { sourceId: source.id }, lock: transaction.LOCK.UPDATE, transaction, order: [['id', 'ASC']] });
    const live = all.filter((e) => e.status !== 'withdrawn' && e.status !== 'rejected');
    const missing = missingForSubmission(source, live.length);
    if (Object.keys(missing).length > 0) {
      throw new HttpError(422, 'validation_failed', `This source is not ready for review: ${Object.values(missing).join(' ')}`, missing);
    }
    const toSubmit = all.filter((e) => transition(e.status, 'submit') !== null);
    // An approved source can carry new draft excerpts: those go to review on their own.
    if (!next && toSubmit.length === 0) throw conflict('This source is approved and has no draft or returned excerpts to submit.');

    if (next) {
      source.set({ status: next, submittedAt: new Date(), version: source.version + 1 });
      await source.save({ transaction });
      await recordSourceVersion(source, actor.id, reason ?? 'Submitted for review', transaction);
    }
    for (const excerpt of toSubmit) {
      excerpt.set({ status: 'submitted', version: excerpt.version + 1 });
      await excerpt.save({ transaction });
      await recordExcerptVersion(excerpt, source.publicId, actor.id, reason ?? 'Submitted for review', transaction);
    }
    return { source, excerpts: toSubmit };
  });

  for (const hook of afterSubmit) {
    try {
      await hook(result, actor);
    } catch (error) {
      console.error('[submit-source] after-submit hook failed', error);
    }
  }
  return result;
}
