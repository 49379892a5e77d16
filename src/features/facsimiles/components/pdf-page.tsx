import { useEffect, useRef, useState } from 'react';
import type { PDFDocumentProxy } from 'pdfjs-dist';
import { Alert } from '@/components/alert';
import { Spinner } from '@/components/spinner';

export interface PdfPageProps {
  url: string;
  page: number;
  zoom: number;
  /** Reports the page count and the page's size at 100 % once known. */
  onDocument: (info: { pageCount: number }) => void;
  onPageSize: (size: { width: number; height: number }) => void;
  label: string;
}

type Loader = typeof import('./pdf-loader');

/** One PDF page on a canvas with its text layer; pdf.js is fetched on first use. */
export function PdfPage({ url, page, zoom, onDocument, onPageSize, label }: PdfPageProps) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const textRef = useRef<HTMLDivElement>(null);
  const [loader, setLoader] = useState<Loader | null>(null);
  const [doc, setDoc] = useState<PDFDocumentProxy | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [rendering, setRendering] = useState(true);
  const callbacks = useRef({ onDocument, onPageSize });
  callbacks.current = { onDocument, onPageSize };

  useEffect(() => {
    let live = true;
    setError(null);
    setDoc(null);
    import('./pdf-loader')
      .then(async (module) => {
        const opened = await module.openDocument(url);
        if (!live) return;
        setLoader(module);
        setDoc(opened);
        callbacks.current.onDocument({ pageCount: opened.numPages });
      })
      .catch((cause: unknown) => live && setError(cause instanceof Error ? cause.message : 'The file could not be opened.'));
    return () => {
      live = false;
    };
  }, [url]);

  useEffect(() => {
    if (!doc || !loader) return;
    const safePage = Math.min(Math.max(1, page), doc.numPages);
    let live = true;
    void loader.pageSize(doc, safePage).then((size) => live && callbacks.current.onPageSize(size));
    return () => {
      live = false;
    };
  }, [doc, loader, page]);

  useEffect(() => {
    if (!doc || !loader || !canvasRef.current || !textRef.current) return;
    const safePage = Math.min(Math.max(1, page), doc.numPages);
    setRendering(true);
    const task = loader.renderPage(doc, safePage, zoom, canvasRef.current, textRef.current);
    task.promise
      .then(() => setRendering(false))
      .catch((cause: unknown) => setError(cause instanceof Error ? cause.message : 'The page could not be drawn.'));
    return () => task.cancel();
  }, [doc, loader, page, zoom]);

  if (error) {
    return (
      <Alert tone="danger" title="The facsimile could not be shown">
        <p>{error}</p>
        <p className="mt-1">
          <a href={url}>Download the file</a> to read it in another program.
        </p>
      </Alert>
    );
  }
  return (
    <div className="relative mx-auto w-max bg-white shadow-leaf">
      {(!doc || rendering) && (
        <div className="absolute inset-0 z-10 flex min-h-40 min-w-40 items-center justify-center text-ink-muted">
          <Spinner label={doc ? `Drawing page ${page}…` : 'Opening the facsimile…'} />
        </div>
      )}
      <canvas ref={canvasRef} role="img" aria-label={label} className="block" />
      <div ref={textRef} className="ww-text-layer" />
    </div>
  );
}
