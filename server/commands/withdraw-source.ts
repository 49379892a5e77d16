import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import { Excerpt, type Source } from '../models';
import { conflict, notFound } from '../errors';
import { authorize } from '../policies';
import { sourcePolicy } from '../policies/source';
import { stateLabels, transition } from '@shared/catalogue/workflow';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { lockSource, recordExcerptVersion, recordSourceVersion } from './support';

/** Which excerpts follow their source: a withdrawal takes back what went to review; reopening brings them back. */
const followers: Record<'withdraw' | 'reopen', WorkflowState[]> = { withdraw: ['submitted'], reopen: ['withdrawn'] };

async function step(actor: SessionUser, publicId: string, action: 'withdraw' | 'reopen', reason?: string): Promise<{ source: Source; excerpts: Excerpt[] }> {
  return getSequelize().transaction(async (transaction) => {
    const source = await lockSource(publicId, transaction);
    if (!sourcePolicy.read(actor, source)) throw notFound('The source');
    authorize(actor, sourcePolicy.step(actor, source), `Only the contributor of this source or an editor may ${action} it.`);
    const next = transition(source.status, action);
    if (!next) {
      const hint = action === 'reopen' ? 'Only withdrawn or rejected sources can be reopened.' : 'Only drafts, submitted and returned sources can be withdrawn.';
      throw conflict(`This source is "${stateLabels[source.status as WorkflowState]}". ${hint}`, { status: `The source is ${source.status}.` });
    }
    source.set({ status: next, version: source.version + 1, ...(action === 'withdraw' ? { submittedAt: null } : {}) });
    await source.save({ transaction });
    await recordSourceVersion(source, actor.id, reason ?? (action === 'withdraw' ? 'Withdrawn' : 'Reopened'), transaction);

    const excerpts = await Excerpt.findAll({ where: { sourceId: source.id, status: followers[action] }, lock: transaction.LOCK.UPDATE, transaction });
    for (const excerpt of excerpts) {
      excerpt.set({ status: transition(excerpt.status, action)!, version: excerpt.version + 1 });
      await excerpt.save({ transaction });
      await recordExcerptVersion(excerpt, source.publicId, actor.id, reason ?? (action === 'withdraw' ? 'Withdrawn with its source' : 'Reopened with its source'), transaction);
    }
    return { source, excerpts };
  });
}

/** Takes a source (and the excerpts it sent to review) back from review or out of the drafts. */
export const withdrawSource = (actor: SessionUser, publicId: string, reason?: string) => step(actor, publicId, 'withdraw', reason);
/** Brings a withdrawn or rejected source back as a draft. */
export const reopenSource = (actor: SessionUser, publicId: string, reason?: string) => step(actor, publicId, 'reopen', reason);
