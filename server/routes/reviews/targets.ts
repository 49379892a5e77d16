import { Excerpt, InstrumentMention, PitchTag, Source } from '../../models';
import { notFound } from '../../errors';
import type { EntityKind } from '@shared/review/types';

export type LoadedTarget = { kind: 'source'; item: Source; source: Source } | { kind: 'excerpt'; item: Excerpt; source: Source };

/** A source or excerpt by public id (excerpts with mentions, pitch tags and source), or 404. */
export async function findTarget(kind: EntityKind, publicId: string): Promise<LoadedTarget> {
  if (kind === 'source') {
    const source = await Source.findOne({ where: { publicId } });
    if (!source) throw notFound('The source');
    return { kind, item: source, source };
  }
  const excerpt = await Excerpt.findOne({
    where: { publicId },
    include: [
      { model: InstrumentMention, as: 'mentions' },
      { model: PitchTag, as: 'pitchTags' },
      { model: Source, as: 'source' },
    ],
  });
  if (!excerpt || !excerpt.source) throw notFound('The excerpt');
  return { kind, item: excerpt, source: excerpt.source };
}

/** The owner check needs the source only for excerpts. */
export const ownerScope = (target: LoadedTarget) => (target.kind === 'excerpt' ? target.source : undefined);
