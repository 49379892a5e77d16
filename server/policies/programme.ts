import type { Programme } from '../models/programme';
import { isSignedIn, type Actor } from './index';

/**
 * Programmes are private to their owner: anyone else gets a 404 (routes check `see` before
 * anything else, so a programme's existence is not revealed). Shared programmes are read
 * through their token only, by anyone.
 */
export const programmePolicy = {
  list: (actor: Actor) => isSignedIn(actor),
  create: (actor: Actor) => isSignedIn(actor),
  see: (actor: Actor, programme: Programme) => isSignedIn(actor) && actor.id === programme.ownerId,
  update: (actor: Actor, programme: Programme) => isSignedIn(actor) && actor.id === programme.ownerId,
  share: (actor: Actor, programme: Programme) => isSignedIn(actor) && actor.id === programme.ownerId,
  delete: (actor: Actor, programme: Programme) => isSignedIn(actor) && actor.id === programme.ownerId,
};
