import { Op } from 'sequelize';
import { getSequelize } from '../db';
import { Excerpt, InstrumentMention, Source } from '../models';
import { badRequest, notFound } from '../errors';
import { runConcordanceHooks } from '../services/concordance';
import type { SessionUser } from '../auth/passport';
import type { ConcordanceChangeResult } from '@shared/review/types';
import { writeNextVersion } from './decide-review';
import { refreshSynonyms } from '@search/settings';

export interface ConcordanceChange {
  term: string;
  language: string;
  fromSize?: string;
  toSize: string;
  mergeInto?: { term: string };
  reason?: string;
}

/**
 * Corrects what a term denotes, or merges a spelling into another: every matching
 * mention (exact spelling and language, and `fromSize` when given) changes through the
 * excerpt's revision mechanism — a new version, its Revision and a search outbox row
 * per excerpt — all in one transaction. Approved excerpts stay approved (an editor's
 * correction, recorded with its reason); the search synonyms are refreshed afterwards.
 */
export async function updateConcordance(actor: SessionUser, change: ConcordanceChange): Promise<ConcordanceChangeResult> {
  const newTerm = change.mergeInto?.term ?? change.term;
  if (newTerm === change.term && change.fromSize === change.toSize) {
    throw badRequest('Nothing to change: the size and the spelling are the same as before.', { toSize: 'Choose another size, or a spelling to merge into.' });
  }
  const result = await getSequelize().transaction(async (transaction) => {
    // The column's collation ignores case and accents; the spelling must match exactly.
    const candidates = await InstrumentMention.findAll({
      where: { term: change.term, language: change.language, ...(change.fromSize ? { sizeSlug: change.fromSize } : {}) },
      transaction,
    });
    const matching = candidates.filter((m) => m.term === change.term);
    if (!matching.length) throw notFound(`A mention of “${change.term}” (${change.language})${change.fromSize ? ` as ${change.fromSize}` : ''}`);
    const excerptIds = [...new Set(matching.map((m) => m.excerptId))].sort((a, b) => a - b);
    const excerpts = await Excerpt.findAll({ where: { id: { [Op.in]: excerptIds } }, order: [['id', 'ASC']], lock: transaction.LOCK.UPDATE, transaction });
    await InstrumentMention.update({ term: newTerm, sizeSlug: change.toSize }, { where: { id: matching.map((m) => m.id) }, transaction });
    const what = change.mergeInto
      ? `merged “${change.term}” into “${newTerm}” (${change.language}) → ${change.toSize}`
      : `“${change.term}” (${change.language}) now denotes ${change.toSize}`;
    const reason = `Concordance: ${what}, by ${actor.displayName}${change.reason ? `: ${change.reason}` : ''}`;
    const sources = new Map((await Source.findAll({ where: { id: [...new Set(excerpts.map((e) => e.sourceId))] }, transaction })).map((s) => [s.id, s]));
    for (const excerpt of excerpts) {
      const republish = excerpt.status === 'approved' ? { approvedVersion: excerpt.version + 1 } : {};
      await writeNextVersion({ kind: 'excerpt', item: excerpt, source: sources.get(excerpt.sourceId)! }, republish, actor.id, reason, transaction);
    }
    return { affectedMentions: matching.length, affectedExcerpts: excerpts.map((e) => e.publicId) };
  });
  try {
    await refreshSynonyms();
  } catch (error) {
    console.error('[concordance] the search synonyms could not be refreshed; the next re-index will:', error);
  }
  await runConcordanceHooks();
  return result;
}
