/**
 * Everything that needs pdf.js lives behind this module, which the viewer imports dynamically:
 * pages that show no facsimile never download pdf.js or its worker.
 */
import * as pdfjs from 'pdfjs-dist';
import type { PDFDocumentProxy, RenderTask } from 'pdfjs-dist';
import workerUrl from 'pdfjs-dist/build/pdf.worker.min.mjs?url';
import './text-layer.css';

pdfjs.GlobalWorkerOptions.workerSrc = workerUrl;

/** Binary files pdf.js asks for (image decoders, the two symbol fonts), served as bundled assets. */
const binaryFiles: Record<string, () => Promise<{ default: string }>> = {
  'openjpeg.wasm': () => import('pdfjs-dist/wasm/openjpeg.wasm?url'),
  'jbig2.wasm': () => import('pdfjs-dist/wasm/jbig2.wasm?url'),
  'qcms_bg.wasm': () => import('pdfjs-dist/wasm/qcms_bg.wasm?url'),
  'FoxitSymbol.pfb': () => import('pdfjs-dist/standard_fonts/FoxitSymbol.pfb?url'),
  'FoxitDingbats.pfb': () => import('pdfjs-dist/standard_fonts/FoxitDingbats.pfb?url'),
};

class BundledBinaryDataFactory {
  async fetch({ filename }: { kind: string; filename: string }): Promise<Uint8Array> {
    const load = binaryFiles[filename];
    if (!load) throw new Error(`No bundled copy of ${filename}`);
    const response = await fetch((await load()).default);
    if (!response.ok) throw new Error(`Could not load ${filename}`);
    return new Uint8Array(await response.arrayBuffer());
  }
}

const documents = new Map<string, Promise<PDFDocumentProxy>>();
const keep = 3;

/** Open (or reuse) the PDF at a URL; the few most recent stay open so page turns are instant. */
export function openDocument(url: string): Promise<PDFDocumentProxy> {
  const cached = documents.get(url);
  if (cached) {
    documents.delete(url);
    documents.set(url, cached);
    return cached;
  }
  const task = pdfjs.getDocument({
    url,
    withCredentials: false,
    isEvalSupported: false,
    useWorkerFetch: false,
    BinaryDataFactory: BundledBinaryDataFactory,
  });
  const promise = task.promise;
  documents.set(url, promise);
  promise.catch(() => documents.delete(url));
  while (documents.size > keep) {
    const [oldest, old] = documents.entries().next().value as [string, Promise<PDFDocumentProxy>];
    documents.delete(oldest);
    void old.then((doc) => doc.destroy()).catch(() => undefined);
  }
  return promise;
}

/** Size of a page in CSS pixels at 100 % (a PDF point is 4/3 px). */
export async function pageSize(doc: PDFDocumentProxy, pageNumber: number): Promise<{ width: number; height: number }> {
  const page = await doc.getPage(pageNumber);
  const viewport = page.getViewport({ scale: pdfjs.PixelsPerInch.PDF_TO_CSS_UNITS });
  return { width: viewport.width, height: viewport.height };
}

export interface PageRendering {
  promise: Promise<void>;
  cancel: () => void;
}

/**
 * Draw a page into the canvas at `zoom` (1 = 100 %), sharp on high-density screens, and lay its
 * text over it in `textLayer` so it can be selected and copied.
 */
export function renderPage(
  doc: PDFDocumentProxy,
  pageNumber: number,
  zoom: number,
  canvas: HTMLCanvasElement,
  textLayer: HTMLDivElement,
): PageRendering {
  let renderTask: RenderTask | null = null;
  let text: InstanceType<typeof pdfjs.TextLayer> | null = null;
  let cancelled = false;
  const promise = (async () => {
    const page = await doc.getPage(pageNumber);
    if (cancelled) return;
    const scale = zoom * pdfjs.PixelsPerInch.PDF_TO_CSS_UNITS;
    const viewport = page.getViewport({ scale });
    const ratio = window.devicePixelRatio || 1;
    canvas.width = Math.floor(viewport.width * ratio);
    canvas.height = Math.floor(viewport.height * ratio);
    canvas.style.width = `${Math.floor(viewport.width)}px`;
    canvas.style.height = `${Math.floor(viewport.height)}px`;
    renderTask = page.render({ canvas, viewport, transform: ratio === 1 ? undefined : [ratio, 0, 0, ratio, 0, 0] });
    textLayer.replaceChildren();
    textLayer.style.setProperty('--total-scale-factor', String(scale));
    text = new pdfjs.TextLayer({ textContentSource: page.streamTextContent(), container: textLayer, viewport });
    await Promise.all([renderTask.promise, text.render()]);
  })();
  return {
    promise: promise.catch((error: unknown) => {
      if (cancelled || (error instanceof Error && error.name === 'RenderingCancelledException')) return;
      throw error;
    }),
    cancel: () => {
      cancelled = true;
      renderTask?.cancel();
      text?.cancel();
    },
  };
}
