import { Router, type Request, type Response } from 'express';
import multer, { MulterError } from 'multer';
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { facsimileIdParamsSchema, facsimilePageParamsSchema, facsimileUploadFieldsSchema, sourceIdParamsSchema } from '@shared/catalogue/requests';
import { validate, fieldErrors } from '../../http/validate';
import { authorize } from '../../policies';
import { sourcePolicy } from '../../policies/source';
import { getConfig } from '../../config';
import { Facsimile, Source, User } from '../../models';
import { badRequest, conflict, HttpError, invalid, notFound, payloadTooLarge } from '../../errors';
import { presentFacsimile } from '../../presenters/facsimile';
import { findSourceFor } from '../../services/catalogue-read';
import { inspectUpload, safeOriginalName, storeFacsimile } from '../../services/facsimile-upload';
import { getFileStore, uploadTempDir } from '../../storage/file-store';
import { assertEditable } from '../../commands/support';

const readableSize = (bytes: number) =>
  bytes >= 1024 * 1024 ? `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB` : `${Math.round(bytes / 1024)} KB`;

/** Receives the multipart body into `dir` (multer disk storage); the caller removes `dir`. */
function receive(req: Request, res: Response, dir: string, maxBytes: number): Promise<void> {
  const upload = multer({
    storage: multer.diskStorage({ destination: dir, filename: (_req, _file, cb) => cb(null, 'upload.bin') }),
    limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 6 },
    defParamCharset: 'utf8',
  } as multer.Options).single('file');
  return new Promise((resolve, reject) =>
    upload(req, res, (error?: unknown) => {
      if (error instanceof MulterError && error.code === 'LIMIT_FILE_SIZE') {
        reject(payloadTooLarge(`The file is larger than the upload limit of ${readableSize(maxBytes)}.`));
      } else if (error instanceof MulterError || error instanceof HttpError) reject(error);
      else if (error) reject(badRequest(`The upload could not be read as multipart/form-data: ${error instanceof Error ? error.message : String(error)}.`));
      else resolve();
    }),
  );
}

/** `POST /api/sources/:id/facsimiles` (multipart: `file`, `rightsConfirmed=true`). */
export function sourceFacsimilesRouter(): Router {
  const router = Router();
  router.post('/:id/facsimiles', validate({ params: sourceIdParamsSchema }), async (req, res) => {
    authorize(req.user, !!req.user);
    const { current: source } = await findSourceFor(req.user, req.params.id as string);
    authorize(req.user, sourcePolicy.update(req.user, source), 'Only the contributor of this source or an editor may upload its facsimile.');
    assertEditable('source', source.status);

    await mkdir(uploadTempDir(), { recursive: true });
    const dir = await mkdtemp(join(uploadTempDir(), 'req-'));
    try {
      await receive(req, res, dir, getConfig().UPLOAD_MAX_BYTES);
      const checked = facsimileUploadFieldsSchema.safeParse({ ...req.body });
      const problems = checked.success ? {} : fieldErrors(checked.error);
      if (!req.file) problems.file = 'Attach the facsimile as the multipart field "file" (PDF, JPEG, PNG or TIFF).';
      if (Object.keys(problems).length > 0) throw invalid(problems);

      const inspected = await inspectUpload(req.file!.path);
      const { facsimile, duplicate } = await storeFacsimile({
        source,
        uploadedById: req.user.id,
        tempPath: req.file!.path,
        originalName: safeOriginalName(req.file!.originalname),
        inspected,
        byteSize: req.file!.size,
      });
      const data = presentFacsimile(facsimile, source.publicId);
      if (duplicate) res.status(200).json({ data, duplicate: true });
      else res.status(201).json({ data });
    } finally {
      // Nothing of a refused (or accepted) upload stays in the temp area.
      await rm(dir, { recursive: true, force: true });
    }
  });
  return router;
}

/** Loads a facsimile and its source, 404 when the person may not read the source. */
async function loadFacsimile(req: Request) {
  const facsimile = await Facsimile.findByPk(Number(req.params.id), { include: [{ model: User, as: 'uploadedBy', attributes: ['id', 'displayName'] }] });
  const source = facsimile ? await Source.findByPk(facsimile.sourceId) : null;
  if (!facsimile || !source || !sourcePolicy.read(req.user, source)) throw notFound('The facsimile');
  return { facsimile, source };
}

const accessMessage = 'This facsimile is shown only to the contributor of its source and to editors (library terms).';

export function facsimilesRouter(): Router {
  const router = Router();

  router.get('/:id', validate({ params: facsimileIdParamsSchema }), async (req, res) => {
    const { facsimile, source } = await loadFacsimile(req);
    res.json({ data: presentFacsimile(facsimile, source.publicId), access: { file: sourcePolicy.viewFacsimile(req.user, source) } });
  });

  router.get('/:id/file', validate({ params: facsimileIdParamsSchema }), async (req, res) => {
    const { facsimile, source } = await loadFacsimile(req);
    authorize(req.user, sourcePolicy.viewFacsimile(req.user, source), accessMessage);
    const stream = await getFileStore().get(facsimile.storageKey);
    res.setHeader('Content-Type', facsimile.mediaType);
    res.setHeader('Content-Length', String(facsimile.byteSize));
    res.setHeader('Content-Disposition', `inline; filename*=UTF-8''${encodeURIComponent(facsimile.originalName)}`);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('Cache-Control', source.facsimileAccess === 'public' ? 'public, max-age=86400' : 'private, max-age=300');
    try {
      await pipeline(stream, res);
    } catch (error) {
      // A reader who closes the tab mid-download is not a server error.
      if ((error as NodeJS.ErrnoException).code !== 'ERR_STREAM_PREMATURE_CLOSE') throw error;
    }
  });

  router.get('/:id/pages/:n/text', validate({ params: facsimilePageParamsSchema }), async (req, res) => {
    const { facsimile, source } = await loadFacsimile(req);
    authorize(req.user, sourcePolicy.viewFacsimile(req.user, source), accessMessage);
    const n = Number(req.params.n);
    if (facsimile.pageCount !== null && n > facsimile.pageCount) throw notFound(`Page ${n} (the facsimile has ${facsimile.pageCount})`);
    if (facsimile.extractionStatus === 'failed') throw conflict(facsimile.extractionError ?? 'Text extraction failed for this facsimile.');
    if (facsimile.extractionStatus !== 'done' || !facsimile.pageTexts) {
      throw conflict(`The text is still being extracted (${facsimile.extractionProgress} of ${facsimile.pageCount ?? '?'} pages); try again shortly.`);
    }
    res.json({ data: { facsimileId: facsimile.id, page: n, pageCount: facsimile.pageCount ?? facsimile.pageTexts.length, text: facsimile.pageTexts[n - 1] ?? '' } });
  });

  return router;
}
