/**
 * PDF reading with pdf.js (legacy build, as Node needs): counting pages at upload and
 * extracting text page by page in the background, with progress stored as it goes.
 */
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { getDocument, type PDFDocumentProxy } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { Facsimile } from '../models';
import { getFileStore } from '../storage/file-store';

const pdfjsRoot = dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json'));
/** pdf.js needs its standard fonts (as a directory path ending in /) to read text drawn in the 14 base fonts. */
const standardFontDataUrl = `${join(pdfjsRoot, 'standard_fonts')}/`;

/** How often progress is written while extracting (pages). */
const PROGRESS_EVERY = 5;

let workerLoaded: Promise<void> | undefined;
/**
 * Loads pdf.js's worker module into this process once (Node runs it in-process). It takes
 * seconds the first time, so the background job starts it early instead of the first upload.
 */
export function loadPdfWorker(): Promise<void> {
  // A specifier held in a variable: the worker ships no type declarations.
  const workerModule = 'pdfjs-dist/legacy/build/pdf.worker.mjs';
  workerLoaded ??= (import(workerModule) as Promise<unknown>).then((worker) => {
    (globalThis as { pdfjsWorker?: unknown }).pdfjsWorker = worker;
  });
  return workerLoaded;
}

export async function openPdf(data: Uint8Array): Promise<PDFDocumentProxy> {
  await loadPdfWorker();
  return getDocument({ data, standardFontDataUrl, isEvalSupported: false, verbosity: 0, stopAtErrors: false }).promise;
}

/** Page count of a PDF after loading every page once, so a damaged file is refused at upload. */
export async function countPdfPages(data: Uint8Array, maxPages: number): Promise<number> {
  const pdf = await openPdf(data);
  try {
    if (pdf.numPages > maxPages) return pdf.numPages;
    for (let n = 1; n <= pdf.numPages; n += 1) (await pdf.getPage(n)).cleanup();
    return pdf.numPages;
  } finally {
    await pdf.destroy();
  }
}

async function readAll(stream: NodeJS.ReadableStream): Promise<Uint8Array> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk as string));
  return new Uint8Array(Buffer.concat(chunks));
}

/** Plain text of one page: items joined, line ends kept. */
async function pageText(pdf: PDFDocumentProxy, n: number): Promise<string> {
  const page = await pdf.getPage(n);
  try {
    const content = await page.getTextContent();
    let text = '';
    for (const item of content.items) {
      if (!('str' in item)) continue;
      text += item.str;
      if (item.hasEOL) text += '\n';
    }
    return text.replace(/[ \t]+\n/g, '\n').trim();
  } finally {
    page.cleanup();
  }
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
      for (let n = 1; n <= pdf.numPages; n += 1) {
        if (shouldStop()) {
          // Shutting down: hand the work back so another process (or the next start) picks it up.
          await facsimile.update({ extractionStatus: 'pending', extractionProgress: 0 });
          return;
        }
        texts.push(await pageText(pdf, n));
        if (n % PROGRESS_EVERY === 0) await facsimile.update({ extractionProgress: n });
      }
      await facsimile.update({ pageCount: pdf.numPages, pageTexts: texts, extractionProgress: pdf.numPages, extractionStatus: 'done', extractionError: null });
    } finally {
      await pdf.destroy();
    }
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    await facsimile.update({ extractionStatus: 'failed', extractionError: `Text extraction failed: ${message}`.slice(0, 1000) }).catch(() => {});
  }
}
