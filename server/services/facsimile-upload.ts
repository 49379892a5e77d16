/** Checking and storing an uploaded facsimile: real type, integrity, duplicates, then file and row. */
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { fileTypeFromFile } from 'file-type';
import { UniqueConstraintError } from 'sequelize';
import { getConfig } from '../config';
import { getSequelize } from '../db';
import { Facsimile, type Source } from '../models';
import { HttpError, unsupportedMediaType } from '../errors';
import { contentKey, getFileStore } from '../storage/file-store';
import { countPdfPages } from '../pdf/reader';

export const acceptedMediaTypes: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/jpeg': 'JPEG',
  'image/png': 'PNG',
  'image/tiff': 'TIFF',
};
const acceptedList = Object.values(acceptedMediaTypes).join(', ');

/** The name as the uploader's computer had it, reduced to a harmless base name (no path, no control characters). */
export function safeOriginalName(name: string | undefined): string {
  const base = basename(String(name ?? '').replace(/\\/g, '/'))
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, '')
    .replace(/^\.+/, '')
    .trim();
  return ([...base].slice(0, 255).join('') || 'facsimile').slice(0, 255);
}

async function sha256Of(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

export interface InspectedUpload {
  mediaType: string;
  sha256: string;
  pageCount: number;
}

/** Type from the bytes (never the name or the browser's claim); a PDF is opened and its pages counted. */
export async function inspectUpload(path: string): Promise<InspectedUpload> {
  const detected = await fileTypeFromFile(path);
  if (!detected || !acceptedMediaTypes[detected.mime]) {
    const found = detected ? `${detected.mime} (.${detected.ext})` : 'data of no recognised file type (for example HTML or text)';
    throw unsupportedMediaType(`The file's contents are ${found}; accepted are ${acceptedList} files.`);
  }
  const sha256 = await sha256Of(path);
  if (detected.mime !== 'application/pdf') return { mediaType: detected.mime, sha256, pageCount: 1 };

  const { UPLOAD_MAX_PAGES } = getConfig();
  let pageCount: number;
  try {
    pageCount = await countPdfPages(new Uint8Array(await readFile(path)), UPLOAD_MAX_PAGES);
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new HttpError(422, 'validation_failed', `The file could not be read as a PDF: ${reason}`, { file: 'The PDF is damaged or incomplete; export or download it again.' });
  }
  if (pageCount > UPLOAD_MAX_PAGES) {
    throw new HttpError(422, 'validation_failed', `The PDF has ${pageCount} pages; at most ${UPLOAD_MAX_PAGES} are accepted. Split it into parts.`, {
      file: `At most ${UPLOAD_MAX_PAGES} pages.`,
    });
  }
  return { mediaType: detected.mime, sha256, pageCount };
}

const findDuplicate = (sourceId: number, sha256: string) => Facsimile.findOne({ where: { sourceId, sha256 } });

/**
 * Stores the file under its content address, then writes the row. If the row cannot be
 * written, the file goes again unless another row uses the same bytes.
 */
export async function storeFacsimile(params: {
  source: Source;
  uploadedById: number;
  tempPath: string;
  originalName: string;
  inspected: InspectedUpload;
  byteSize: number;
}): Promise<{ facsimile: Facsimile; duplicate: boolean }> {
  const { source, inspected } = params;
  const existing = await findDuplicate(source.id, inspected.sha256);
  if (existing) return { facsimile: existing, duplicate: true };

  const store = getFileStore();
  const key = contentKey(inspected.sha256);
  if (!(await store.exists(key))) await store.put(key, createReadStream(params.tempPath));
  const isImage = inspected.mediaType !== 'application/pdf';
  try {
    const facsimile = await getSequelize().transaction((transaction) =>
      Facsimile.create(
        {
          sourceId: source.id,
          storageKey: key,
          originalName: params.originalName,
          mediaType: inspected.mediaType,
          byteSize: params.byteSize,
          sha256: inspected.sha256,
          pageCount: inspected.pageCount,
          // Images have no text to extract: done at once.
          extractionStatus: isImage ? 'done' : 'pending',
          extractionProgress: isImage ? 1 : 0,
          extractionError: null,
          pageTexts: isImage ? [] : null,
          rightsConfirmedAt: new Date(),
          uploadedById: params.uploadedById,
        },
        { transaction },
      ),
    );
    return { facsimile, duplicate: false };
  } catch (error) {
    // Two uploads of the same bytes at once: the unique index lets one row win.
    if (error instanceof UniqueConstraintError) {
      const winner = await findDuplicate(source.id, inspected.sha256);
      if (winner) return { facsimile: winner, duplicate: true };
    }
    if ((await Facsimile.count({ where: { storageKey: key } })) === 0) await store.delete(key).catch(() => {});
    throw error;
  }
}
