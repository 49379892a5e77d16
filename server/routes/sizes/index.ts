import { Router } from 'express';
import { sizeSlugParamsSchema, updateSizeSchema } from '@shared/catalogue/requests';
import { validate } from '../../http/validate';
import { allow, atLeast } from '../../policies';
import { InstrumentSizeRecord } from '../../models';
import { invalid, notFound } from '../../errors';
import { presentSize } from '../../presenters/size';
import { parseNote } from '@shared/reckoner/notes';
import { getSequelize } from '../../db';

const sizePolicy = { update: (actor: Parameters<typeof atLeast>[0]): boolean => atLeast(actor, 'editor') };

/** The instrument size vocabulary: public to read, editors keep it (the slug never changes). */
export function sizesRouter(): Router {
  const router = Router();

  router.get('/', async (_req, res) => {
    const sizes = await InstrumentSizeRecord.findAll({ order: [['sortOrder', 'ASC'], ['slug', 'ASC']] });
    res.json({ data: sizes.map(presentSize) });
  });

  router.patch(
    '/:slug',
    allow(sizePolicy.update, 'Only editors keep the size vocabulary.'),
    validate({ params: sizeSlugParamsSchema, body: updateSizeSchema }),
    async (req, res) => {
      const body = req.body as import('zod').output<typeof updateSizeSchema>;
      const size = await getSequelize().transaction(async (transaction) => {
        const row = await InstrumentSizeRecord.findOne({ where: { slug: req.params.slug as string }, lock: transaction.LOCK.UPDATE, transaction });
        if (!row) throw notFound(`The size "${req.params.slug}"`);
        if (body.range && parseNote(body.range.lowest).midi >= parseNote(body.range.highest).midi) {
          throw invalid({ 'range.highest': 'The highest note must lie above the lowest.' });
        }
        if (body.name !== undefined) row.name = body.name;
        if (body.otherNames !== undefined) row.otherNames = body.otherNames;
        if (body.hornbostelSachs !== undefined) row.hornbostelSachs = body.hornbostelSachs;
        if (body.range) {
          row.rangeLowest = body.range.lowest;
          row.rangeHighest = body.range.highest;
        }
        await row.save({ transaction });
        return row;
      });
      res.json({ data: presentSize(size) });
    },
  );

  return router;
}
