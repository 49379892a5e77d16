import type { Sequelize } from 'sequelize';
import { User } from './user';
import { Session } from './session';
import { PasswordReset } from './password-reset';
import { Source } from './source';
import { Facsimile } from './facsimile';
import { Excerpt, InstrumentMention, PitchTag } from './excerpt';
import { Revision } from './revision';
import { Review } from './review';
import { SearchOutbox } from './search-outbox';
import { InstrumentSizeRecord } from './instrument-size';
import { Programme } from './programme';

export { User, Session, PasswordReset, Source, Facsimile, Excerpt, InstrumentMention, PitchTag, Revision, Review, SearchOutbox, InstrumentSizeRecord, Programme };

interface RegisteredModel {
  initModel(sequelize: Sequelize): void;
  associate?(): void;
}

/**
 * Every model of the app, in dependency order. A feature adds its model here; the
 * model's own static `associate()` declares its associations, and a migration in
 * server/migrations creates its table.
 */
const registry: RegisteredModel[] = [
  User,
  Session,
  PasswordReset,
  InstrumentSizeRecord,
  Source,
  Facsimile,
  Excerpt,
  InstrumentMention,
  PitchTag,
  Revision,
  Review,
  SearchOutbox,
  Programme,
];

export function initModels(sequelize: Sequelize): void {
  for (const model of registry) model.initModel(sequelize);
  for (const model of registry) model.associate?.();
}
