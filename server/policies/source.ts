import type { Source } from '../models';
import type { SourceAbilities } from '@shared/catalogue/types';
import { isEditable, transition } from '@shared/catalogue/workflow';
import { atLeast, type Actor } from './index';

type SourceLike = Pick<Source, 'contributorId' | 'status' | 'approvedVersion'>;

const isOwner = (actor: Actor, source: SourceLike): boolean => atLeast(actor, 'contributor') && actor.id === source.contributorId;
const isEditor = (actor: Actor): boolean => atLeast(actor, 'editor');

/** Public material: approved now, or approved before and now carrying a newer version under review. */
export const isPublished = (record: { status: string; approvedVersion: number | null }) =>
  record.status === 'approved' || record.approvedVersion !== null;

/**
 * Who may do what with a source. Rules that depend on the workflow state are separate
 * (`canEditState`) so a route can answer 409 "it is awaiting review" instead of 403.
 */
export const sourcePolicy = {
  create: (actor: Actor): boolean => atLeast(actor, 'contributor'),
  /** Sees the current version, drafts included. */
  readCurrent: (actor: Actor, source: SourceLike): boolean => isOwner(actor, source) || isEditor(actor),
  read: (actor: Actor, source: SourceLike): boolean => isPublished(source) || sourcePolicy.readCurrent(actor, source),
  update: (actor: Actor, source: SourceLike): boolean => isOwner(actor, source) || isEditor(actor),
  /** Saving approved material and keeping it approved skips review: editors only. */
  publish: (actor: Actor): boolean => isEditor(actor),
  step: (actor: Actor, source: SourceLike): boolean => isOwner(actor, source) || isEditor(actor),
  review: (actor: Actor): boolean => isEditor(actor),
  /** The facsimile file and its text follow the source's `facsimileAccess` (library terms). */
  viewFacsimile: (actor: Actor, source: SourceLike & { facsimileAccess: string }): boolean => {
    if (!sourcePolicy.read(actor, source)) return false;
    if (source.facsimileAccess === 'public') return true;
    if (source.facsimileAccess === 'signed-in') return !!actor;
    return sourcePolicy.readCurrent(actor, source);
  },
  /** Lists: editors see everything; contributors their own too. */
  seesAll: (actor: Actor): boolean => isEditor(actor),
};

export function sourceAbilities(actor: Actor, source: SourceLike): SourceAbilities {
  const mayChange = sourcePolicy.update(actor, source);
  const editable = isEditable(source.status);
  return {
    update: mayChange && editable,
    // An approved source can still carry new draft excerpts to submit.
    submit: sourcePolicy.step(actor, source) && (transition(source.status, 'submit') !== null || source.status === 'approved'),
    withdraw: sourcePolicy.step(actor, source) && transition(source.status, 'withdraw') !== null,
    reopen: sourcePolicy.step(actor, source) && transition(source.status, 'reopen') !== null,
    upload: mayChange && editable,
    addExcerpt: mayChange && editable,
    review: sourcePolicy.review(actor) && source.status === 'submitted',
    publish: sourcePolicy.publish(actor) && editable,
  };
}

/** Why a record in this state cannot be edited, and what to do about it; null when it can. */
export function notEditableReason(what: 'source' | 'excerpt', status: string): string | null {
  switch (status) {
    case 'submitted':
      return `This ${what} is awaiting review; wait for the editors' decision (or withdraw it) before editing.`;
    case 'withdrawn':
      return `This ${what} was withdrawn; reopen it to edit it again.`;
    case 'rejected':
      return `This ${what} was rejected; reopen it as a draft to edit it again.`;
    default:
      return null;
  }
}
