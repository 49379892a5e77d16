/**
 * Text extraction for facsimiles in the background: page by page through the PDF reader
 * (server/pdf/reader.ts), with progress stored as it goes.
 */
import { Facsimile } from '../models';
import { getFileStore } from '../storage/file-store';
import { openPdf } from '../pdf/reader';

/** How often progress is written while extracting (pages). */
const PROGRESS_EVERY = 5;

async function readAll(stream: NodeJS.ReadableStream): Promise<Uint8Array> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk as string));
  return new Uint8Array(Buffer.concat(chunks));
}

/** Extracts the text of a claimed facsimile and records the outcome; never throws. */
export async function extractFacsimileText(facsimile: Facsimile, shouldStop: () => boolean = () => false): Promise<void> {
  try {
    if (facsimile.mediaType !== 'application/pdf') {
      await facsimile.update({ pageCount: 1, pageTexts: [], extractionProgress: 1, extractionStatus: 'done', extractionError: null });
      return;
    }
    const data = await readAll(await getFileStore().get(facsimile.storageKey));
    const pdf = await openPdf(data);
    try {
      const texts: string[] = [];
      for (let n = 1; n <= pdf.pageCount; n += 1) {
        if (shouldStop()) {
          // Shutting down: hand the work back so another process (or the next start) picks it up.
          await facsimile.update({ extractionStatus: 'pending', extractionProgress: 0 });
          return;
        }
        texts.push(await pdf.pageText(n));
        if (n % PROGRESS_EVERY === 0) await facsimile.update({ extractionProgress: n });
      }
      await facsimile.update({ pageCount: pdf.pageCount, pageTexts: texts, extractionProgress: pdf.pageCount, extractionStatus: 'done', extractionError: null });
    } finally {
      await pdf.close();
    }
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    await facsimile.update({ extractionStatus: 'failed', extractionError: `Text extraction failed: ${message}`.slice(0, 1000) }).catch(() => {});
  }
}
