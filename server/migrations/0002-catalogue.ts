import { DataTypes } from 'sequelize';
import type { Migration } from './types';
import {
  calendarNotes,
  certainties,
  facsimileAccessLevels,
  locatorTypes,
  pitchDerivations,
  reviewDecisions,
  sourceTypes,
  workflowStates,
} from '../../shared/catalogue/vocabulary';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string, onDelete: 'CASCADE' | 'RESTRICT' | 'SET NULL' = 'CASCADE', allowNull = false) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('instrument_sizes', {
    id,
    slug: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    family: { type: DataTypes.STRING(40), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    other_names: { type: DataTypes.JSON, allowNull: false },
    nominal_note: { type: DataTypes.STRING(8), allowNull: false },
    written_octave_offset: { type: DataTypes.TINYINT, allowNull: false },
    range_lowest: { type: DataTypes.STRING(8), allowNull: false },
    range_highest: { type: DataTypes.STRING(8), allowNull: false },
    hornbostel_sachs: { type: DataTypes.STRING(40), allowNull: false },
    sort_order: { type: DataTypes.SMALLINT, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('sources', {
    id,
    public_id: { type: DataTypes.STRING(12), allowNull: false, unique: true },
    title: { type: DataTypes.STRING(500), allowNull: false },
    source_type: { type: DataTypes.ENUM(...sourceTypes), allowNull: false },
    creators: { type: DataTypes.JSON, allowNull: false },
    date_edtf: { type: DataTypes.STRING(100), allowNull: false },
    date_earliest: { type: DataTypes.DATEONLY, allowNull: false },
    date_latest: { type: DataTypes.DATEONLY, allowNull: false },
    date_label: { type: DataTypes.STRING(120), allowNull: false },
    calendar_note: { type: DataTypes.ENUM(...calendarNotes), allowNull: false, defaultValue: 'unstated' },
    place: { type: DataTypes.STRING(255), allowNull: true },
    languages: { type: DataTypes.JSON, allowNull: false },
    holding_institution: { type: DataTypes.STRING(255), allowNull: true },
    shelfmark: { type: DataTypes.STRING(255), allowNull: true },
    publication: { type: DataTypes.JSON, allowNull: true },
    external_url: { type: DataTypes.STRING(1000), allowNull: true },
    rights_statement: { type: DataTypes.TEXT, allowNull: true },
    facsimile_access: { type: DataTypes.ENUM(...facsimileAccessLevels), allowNull: false, defaultValue: 'signed-in' },
    status: { type: DataTypes.ENUM(...workflowStates), allowNull: false, defaultValue: 'draft' },
    contributor_id: ref('users', 'RESTRICT'),
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    approved_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    submitted_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('sources', ['status']);
  await qi.addIndex('sources', ['contributor_id']);
  await qi.addIndex('sources', ['date_earliest', 'date_latest']);

  await qi.createTable('facsimiles', {
    id,
    source_id: ref('sources'),
    storage_key: { type: DataTypes.STRING(255), allowNull: false },
    original_name: { type: DataTypes.STRING(255), allowNull: false },
    media_type: { type: DataTypes.STRING(100), allowNull: false },
    byte_size: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    page_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    extraction_status: { type: DataTypes.ENUM('pending', 'running', 'done', 'failed'), allowNull: false, defaultValue: 'pending' },
    extraction_progress: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    extraction_error: { type: DataTypes.STRING(1000), allowNull: true },
    page_texts: { type: DataTypes.JSON, allowNull: true },
    rights_confirmed_at: { type: DataTypes.DATE, allowNull: false },
    uploaded_by_id: ref('users', 'RESTRICT'),
    ...timestamps,
  });
  await qi.addIndex('facsimiles', ['sha256']);
  await qi.addIndex('facsimiles', ['source_id']);

  await qi.createTable('excerpts', {
    id,
    public_id: { type: DataTypes.STRING(12), allowNull: false, unique: true },
    source_id: ref('sources'),
    locator_type: { type: DataTypes.ENUM(...locatorTypes), allowNull: false },
    locator_value: { type: DataTypes.STRING(40), allowNull: false },
    facsimile_page: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    diplomatic: { type: DataTypes.TEXT, allowNull: false },
    normalised: { type: DataTypes.TEXT, allowNull: true },
    translation: { type: DataTypes.TEXT, allowNull: true },
    translation_language: { type: DataTypes.STRING(20), allowNull: true },
    translator: { type: DataTypes.STRING(200), allowNull: true },
    commentary: { type: DataTypes.TEXT, allowNull: true },
    date_edtf: { type: DataTypes.STRING(100), allowNull: true },
    date_earliest: { type: DataTypes.DATEONLY, allowNull: true },
    date_latest: { type: DataTypes.DATEONLY, allowNull: true },
    date_label: { type: DataTypes.STRING(120), allowNull: true },
    topics: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.ENUM(...workflowStates), allowNull: false, defaultValue: 'draft' },
    contributor_id: ref('users', 'RESTRICT'),
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    approved_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('excerpts', ['source_id']);
  await qi.addIndex('excerpts', ['status']);

  await qi.createTable('instrument_mentions', {
    id,
    excerpt_id: ref('excerpts'),
    term: { type: DataTypes.STRING(200), allowNull: false },
    language: { type: DataTypes.STRING(20), allowNull: false },
    size_slug: { type: DataTypes.STRING(40), allowNull: false },
    certainty: { type: DataTypes.ENUM(...certainties), allowNull: false },
    note: { type: DataTypes.STRING(1000), allowNull: true },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('instrument_mentions', ['excerpt_id']);
  await qi.addIndex('instrument_mentions', ['term', 'language']);
  await qi.addIndex('instrument_mentions', ['size_slug']);

  await qi.createTable('pitch_tags', {
    id,
    excerpt_id: ref('excerpts'),
    statement: { type: DataTypes.STRING(1000), allowNull: false },
    a_hz: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
    cents_from_440: { type: DataTypes.DECIMAL(6, 1), allowNull: false },
    derivation: { type: DataTypes.ENUM(...pitchDerivations), allowNull: false },
    note: { type: DataTypes.STRING(1000), allowNull: true },
    position: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('pitch_tags', ['excerpt_id']);

  await qi.createTable('revisions', {
    id,
    entity_type: { type: DataTypes.ENUM('source', 'excerpt'), allowNull: false },
    entity_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    snapshot: { type: DataTypes.JSON, allowNull: false },
    author_id: ref('users', 'RESTRICT'),
    reason: { type: DataTypes.STRING(500), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('revisions', ['entity_type', 'entity_id', 'version'], { unique: true });

  await qi.createTable('reviews', {
    id,
    entity_type: { type: DataTypes.ENUM('source', 'excerpt'), allowNull: false },
    entity_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    editor_id: ref('users', 'RESTRICT'),
    decision: { type: DataTypes.ENUM(...reviewDecisions), allowNull: false },
    comment: { type: DataTypes.TEXT, allowNull: true },
    field_comments: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('reviews', ['entity_type', 'entity_id']);

  await qi.createTable('search_outbox', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    entity_type: { type: DataTypes.ENUM('source', 'excerpt'), allowNull: false },
    entity_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    operation: { type: DataTypes.ENUM('upsert', 'delete'), allowNull: false },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.STRING(1000), allowNull: true },
    available_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('search_outbox', ['available_at']);
};

export const down: Migration = async ({ context: qi }) => {
  for (const table of ['search_outbox', 'reviews', 'revisions', 'pitch_tags', 'instrument_mentions', 'excerpts', 'facsimiles', 'sources', 'instrument_sizes']) {
    await qi.dropTable(table);
  }
};
