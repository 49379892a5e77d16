// @ts-check
/**
 * The pdf.js side of server/pdf/reader.ts, run in a worker thread. pdf.js's legacy build
 * (the one Node needs) installs core-js polyfills over built-ins such as Array.prototype.push
 * and JSON.stringify; inside this thread they slow nothing but pdf.js itself.
 * Plain JavaScript: a worker thread starts without the TypeScript loader.
 *
 * Messages in: { id, op: 'count', data, maxPages } | { id, op: 'open', data }
 *            | { id, op: 'page', doc, n } | { id, op: 'close', doc }
 * Messages out: { id, result } | { id, error }
 */
import { parentPort } from 'node:worker_threads';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

const pdfjsRoot = dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json'));
// pdf.js needs its standard fonts (a directory path ending in /) to read text drawn in the 14 base fonts.
const standardFontDataUrl = `${join(pdfjsRoot, 'standard_fonts')}/`;
// Node runs pdf.js's own worker in-process (this thread): load it once, up front.
globalThis.pdfjsWorker = await import('pdfjs-dist/legacy/build/pdf.worker.mjs');

/** @type {Map<number, import('pdfjs-dist').PDFDocumentProxy>} */
const open = new Map();
let nextDoc = 1;

/** @param {Uint8Array} data */
function load(data) {
  return getDocument({ data, standardFontDataUrl, isEvalSupported: false, verbosity: 0, stopAtErrors: false }).promise;
}

/** Page count after loading every page once, so a damaged file is refused at upload. */
async function count(data, maxPages) {
  const pdf = await load(data);
  try {
    if (pdf.numPages > maxPages) return pdf.numPages;
    for (let n = 1; n <= pdf.numPages; n += 1) (await pdf.getPage(n)).cleanup();
    return pdf.numPages;
  } finally {
    await pdf.destroy();
  }
}

/** Plain text of one page: items joined, line ends kept. */
async function pageText(pdf, n) {
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

function documentOf(doc) {
  const pdf = open.get(doc);
  if (!pdf) throw new Error(`No open PDF document ${doc}.`);
  return pdf;
}

const operations = {
  count: (m) => count(m.data, m.maxPages),
  open: async (m) => {
    const pdf = await load(m.data);
    const doc = nextDoc++;
    open.set(doc, pdf);
    return { doc, pageCount: pdf.numPages };
  },
  page: (m) => pageText(documentOf(m.doc), m.n),
  close: async (m) => {
    const pdf = open.get(m.doc);
    open.delete(m.doc);
    await pdf?.destroy();
    return null;
  },
};

parentPort?.on('message', async (message) => {
  try {
    const operation = operations[message.op];
    if (!operation) throw new Error(`Unknown operation ${message.op}.`);
    parentPort?.postMessage({ id: message.id, result: await operation(message) });
  } catch (error) {
    parentPort?.postMessage({ id: message.id, error: error instanceof Error ? error.message : String(error) });
  }
});
parentPort?.postMessage({ ready: true });
