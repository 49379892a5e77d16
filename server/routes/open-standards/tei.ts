import { Router } from 'express';
import { z } from 'zod';
import { validate } from '../../http/validate';
import { Excerpt, InstrumentMention, PitchTag, Source, User } from '../../models';
import { notFound } from '../../errors';
import { buildTei } from '../../services/open-standards/tei';
import { permalink } from '../../services/permalinks';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';

const params = z.object({ id: z.string().regex(/^S[0-9A-Z]{7}$/, { error: 'A source id looks like S7K2QX9A' }) });
const sizeNames = Object.fromEntries(INSTRUMENT_SIZES.map((s) => [s.slug, s.name]));

/** `GET /api/sources/:id/tei`: TEI P5 of an approved source and its approved excerpts, for anyone. */
export function teiRouter(): Router {
  const router = Router();
  router.get('/:id/tei', validate({ params }), async (req, res) => {
    const source = await Source.findOne({
      where: { publicId: req.params.id, status: 'approved' },
      include: [{ model: User, as: 'contributor' }],
    });
    if (!source) throw notFound('An approved source with this id');
    const excerpts = await Excerpt.findAll({
      where: { sourceId: source.id, status: 'approved' },
      include: [
        { model: InstrumentMention, as: 'mentions' },
        { model: PitchTag, as: 'pitchTags' },
      ],
      order: [['facsimilePage', 'ASC'], ['id', 'ASC']],
    });
    const xml = buildTei({ source, excerpts, sizeNames, permalink });
    res
      .type('application/tei+xml; charset=utf-8')
      .set('Content-Disposition', `inline; filename="${source.publicId}.tei.xml"`)
      .send(xml);
  });
  return router;
}
