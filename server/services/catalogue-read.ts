/**
 * Reading the catalogue as a given person sees it: the current version for its contributor
 * and editors, the last approved version (from its revision snapshot) for everyone else.
 */
import { Op } from 'sequelize';
import { Excerpt, InstrumentMention, InstrumentSizeRecord, PitchTag, Revision, Review, Source, User } from '../models';
import type { EntityType } from '../models/revision';
import { notFound } from '../errors';
import type { Actor } from '../policies';
import { sourcePolicy } from '../policies/source';
import { excerptPolicy } from '../policies/excerpt';
import type { SizeNames } from '../presenters/excerpt';

// Include options are built afresh for every query: Sequelize writes into the objects it is given.
const credit = () => ({ model: User, as: 'contributor', attributes: ['id', 'displayName'] });
const tags = () => [
  { model: InstrumentMention, as: 'mentions' },
  { model: PitchTag, as: 'pitchTags' },
];

/** Content columns a snapshot may set on a view; ids, owner and timestamps stay the row's. */
function snapshotFields(snapshot: Record<string, unknown>, exclude: string[]) {
  const skip = new Set(['id', 'publicId', 'sourceId', 'contributorId', 'createdAt', 'updatedAt', 'excerptIds', 'sourcePublicId', ...exclude]);
  return Object.fromEntries(Object.entries(snapshot).filter(([key]) => !skip.has(key)));
}

/** An unsaved Source carrying the approved version's fields, for presenting only. */
export function sourceFromSnapshot(current: Source, snapshot: Record<string, unknown>): Source {
  const view = Source.build({ ...current.get({ plain: true }), ...snapshotFields(snapshot, []), status: 'approved', version: current.approvedVersion! } as never);
  view.contributor = current.contributor;
  return view;
}

export function excerptFromSnapshot(current: Excerpt, snapshot: Record<string, unknown>): Excerpt {
  const view = Excerpt.build({ ...current.get({ plain: true }), ...snapshotFields(snapshot, ['mentions', 'pitchTags']), status: 'approved', version: current.approvedVersion! } as never);
  const list = (value: unknown) => (Array.isArray(value) ? (value as Record<string, unknown>[]) : []);
  view.mentions = list(snapshot.mentions).map((m, position) => ({ ...m, position })) as unknown as InstrumentMention[];
  view.pitchTags = list(snapshot.pitchTags).map((t, position) => ({ ...t, position })) as unknown as PitchTag[];
  view.contributor = current.contributor;
  return view;
}

async function approvedSnapshots(entityType: EntityType, rows: { id: number; approvedVersion: number | null }[]) {
  const wanted = rows.filter((r) => r.approvedVersion !== null);
  if (wanted.length === 0) return new Map<number, Record<string, unknown>>();
  const revisions = await Revision.findAll({
    where: { entityType, [Op.or]: wanted.map((r) => ({ entityId: r.id, version: r.approvedVersion! })) },
  });
  return new Map(revisions.map((r) => [r.entityId, r.snapshot]));
}

export interface SourceView {
  /** What this person sees (the row, or the approved version built from its snapshot). */
  source: Source;
  /** The row itself, for policies and writes. */
  current: Source;
  showingApprovedVersion: boolean;
}

export async function sourceViewsFor(actor: Actor, rows: Source[]): Promise<SourceView[]> {
  const needSnapshot = rows.filter((s) => s.status !== 'approved' && !sourcePolicy.readCurrent(actor, s));
  const snapshots = await approvedSnapshots('source', needSnapshot);
  return rows.map((current) => {
    const snapshot = needSnapshot.includes(current) ? snapshots.get(current.id) : undefined;
    return snapshot ? { source: sourceFromSnapshot(current, snapshot), current, showingApprovedVersion: true } : { source: current, current, showingApprovedVersion: false };
  });
}

/** The source as this person may see it, or 404 (drafts are invisible rather than forbidden). */
export async function findSourceFor(actor: Actor, publicId: string): Promise<SourceView> {
  const current = await Source.findOne({ where: { publicId }, include: [credit()] });
  if (!current || !sourcePolicy.read(actor, current)) throw notFound('The source');
  return (await sourceViewsFor(actor, [current]))[0];
}

/** The excerpts of a source this person may see, in catalogue order, with mentions and pitch tags. */
export async function excerptsFor(actor: Actor, source: Source): Promise<Excerpt[]> {
  const rows = await Excerpt.findAll({ where: { sourceId: source.id }, include: tags(), order: [['id', 'ASC']] });
  const visible = rows.filter((e) => excerptPolicy.read(actor, e, source));
  const needSnapshot = visible.filter((e) => e.status !== 'approved' && !excerptPolicy.readCurrent(actor, e, source));
  const snapshots = await approvedSnapshots('excerpt', needSnapshot);
  return visible.flatMap((e) => {
    if (!needSnapshot.includes(e)) return [e];
    const snapshot = snapshots.get(e.id);
    return snapshot ? [excerptFromSnapshot(e, snapshot)] : [];
  });
}

export interface ExcerptView {
  excerpt: Excerpt;
  current: Excerpt;
  source: SourceView;
  showingApprovedVersion: boolean;
}

export async function findExcerptFor(actor: Actor, publicId: string): Promise<ExcerptView> {
  // One query for the excerpt, its tags, its source and both credits (an excerpt page is the most read page).
  const current = await Excerpt.findOne({ where: { publicId }, include: [...tags(), credit(), { model: Source, as: 'source', include: [credit()] }] });
  const source = current?.source ?? null;
  if (!current || !source || !excerptPolicy.read(actor, current, source)) throw notFound('The excerpt');
  const [sourceView] = await sourceViewsFor(actor, [source]);
  if (current.status === 'approved' || excerptPolicy.readCurrent(actor, current, source)) {
    return { excerpt: current, current, source: sourceView, showingApprovedVersion: false };
  }
  const snapshot = (await approvedSnapshots('excerpt', [current])).get(current.id);
  if (!snapshot) throw notFound('The excerpt');
  return { excerpt: excerptFromSnapshot(current, snapshot), current, source: sourceView, showingApprovedVersion: true };
}

export async function sizeNames(): Promise<SizeNames> {
  // Plain rows: building model instances would cost more than the query for this lookup table.
  const rows = await InstrumentSizeRecord.findAll({ attributes: ['slug', 'name'], raw: true });
  return new Map(rows.map((r) => [r.slug, r.name]));
}

/**
 * The revision history this person may read: everything for those who see drafts,
 * only approved versions for everyone else (drafts stay private).
 */
export async function revisionsFor(
  entityType: EntityType,
  entity: { id: number; approvedVersion: number | null },
  seesDrafts: boolean,
): Promise<Revision[]> {
  const revisions = await Revision.findAll({
    where: { entityType, entityId: entity.id },
    include: [{ model: User, as: 'author', attributes: ['id', 'displayName'] }],
    order: [['version', 'ASC']],
  });
  if (seesDrafts) return revisions;
  const approvals = await Review.findAll({ where: { entityType, entityId: entity.id, decision: 'approve' }, attributes: ['version'] });
  const approved = new Set([...approvals.map((r) => r.version), ...(entity.approvedVersion ? [entity.approvedVersion] : [])]);
  return revisions.filter((r) => approved.has(r.version) && r.version <= (entity.approvedVersion ?? 0));
}
