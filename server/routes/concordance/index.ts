import { Router } from 'express';
import { validate } from '../../http/validate';
import { allow } from '../../policies';
import { reviewPolicy } from '../../policies/review';
import { buildConcordance } from '../../services/concordance';
import { updateConcordance } from '../../commands/update-concordance';
import { concordancePatchSchema } from '@shared/review/schemas';

/** The concordance of historical instrument terms: public reading, editors correct and merge. */
export function concordanceRouter(): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json({ data: await buildConcordance(), abilities: { edit: reviewPolicy.editConcordance(req.user) } });
  });

  router.patch('/', allow(reviewPolicy.editConcordance, 'Only editors change the concordance.'), validate({ body: concordancePatchSchema }), async (req, res) => {
    const result = await updateConcordance(req.user!, req.body);
    res.json({ data: result });
  });

  return router;
}
