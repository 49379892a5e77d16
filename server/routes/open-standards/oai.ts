import { Router, type Request } from 'express';
import { handleOaiRequest } from '../../services/open-standards/oai-pmh';
import { permalink } from '../../services/permalinks';
import { publicUrl } from '../../config';

/** `GET|POST /oai`: the OAI-PMH 2.0 endpoint (§3.1.1.1 allows both methods). Errors are in the XML, status 200. */
export function oaiRouter(): Router {
  const router = Router();
  const answer = async (req: Request, args: Record<string, string | string[] | undefined>) =>
    handleOaiRequest(args, { baseUrl: `${publicUrl()}/oai`, permalink: (id, version) => permalink('sources', id, version) });
  router.get('/', async (req, res) => {
    res.type('text/xml; charset=utf-8').send(await answer(req, req.query as Record<string, string | string[]>));
  });
  router.post('/', async (req, res) => {
    res.type('text/xml; charset=utf-8').send(await answer(req, (req.body ?? {}) as Record<string, string | string[]>));
  });
  return router;
}
