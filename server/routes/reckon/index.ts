import { Router, type RequestHandler } from 'express';
import { reckonDate, reckonDateQuerySchema, reckonFingeringQuerySchema, reckonSounding, reckonSoundingQuerySchema, fingeringKey, ReckonerError } from '@shared/reckoner';
import type { ReckonDateQuery, ReckonFingeringQuery, ReckonSoundingQuery } from '@shared/reckoner';
import { validate } from '../../http/validate';
import { invalid } from '../../errors';

/** Runs a reckoner computation; its typed errors become a 400 naming the parameter. */
function answer<Q>(compute: (query: Q) => unknown): RequestHandler {
  return (req, res) => {
    try {
      res.set('Cache-Control', 'public, max-age=3600').json(compute(req.query as Q));
    } catch (error) {
      if (error instanceof ReckonerError) throw invalid({ [error.field]: error.message }, error.message);
      throw error;
    }
  };
}

/** The public Pitch & size reckoner: pure computations from ./shared, open to everyone. */
export function reckonRouter(): Router {
  const router = Router();
  router.get(
    '/sounding',
    validate({ query: reckonSoundingQuerySchema }),
    answer<ReckonSoundingQuery>((q) => reckonSounding(q.size, q.a)),
  );
  router.get(
    '/fingering',
    validate({ query: reckonFingeringQuerySchema }),
    answer<ReckonFingeringQuery>((q) => fingeringKey(q.size, q.key, q.fingering)),
  );
  router.get(
    '/date',
    validate({ query: reckonDateQuerySchema }),
    answer<ReckonDateQuery>((q) => reckonDate({ value: q.value, calendar: q.calendar, yearStart: q.yearStart })),
  );
  return router;
}
