/**
 * Reading PDFs with pdf.js, in one worker thread (reader-thread.mjs) shared by the process:
 * counting pages at upload and extracting text page by page. Off the main thread for two
 * reasons: a large PDF's parsing does not stall requests, and pdf.js's legacy build replaces
 * built-ins (Array.prototype.push, JSON.stringify) with slower polyfills wherever it loads.
 * A request that takes longer than REQUEST_TIMEOUT_MS ends the thread (a pathological file
 * must not hang uploads); the next request starts a new one.
 */
import { Worker } from 'node:worker_threads';

const REQUEST_TIMEOUT_MS = 120_000;

type Operation =
  | { op: 'count'; data: Uint8Array; maxPages: number }
  | { op: 'open'; data: Uint8Array }
  | { op: 'page'; doc: number; n: number }
  | { op: 'close'; doc: number };

interface Pending {
  resolve(value: unknown): void;
  reject(error: Error): void;
  timer: NodeJS.Timeout;
}

interface Thread {
  worker: Worker;
  ready: Promise<void>;
  pending: Map<number, Pending>;
}

let thread: Thread | undefined;
let nextId = 1;

function startThread(): Thread {
  const worker = new Worker(new URL('./reader-thread.mjs', import.meta.url));
  const pending = new Map<number, Pending>();
  let markReady!: () => void;
  let markFailed!: (error: Error) => void;
  const ready = new Promise<void>((resolve, reject) => ((markReady = resolve), (markFailed = reject)));
  ready.catch(() => {}); // reported to whoever awaits it; not an unhandled rejection otherwise
  const current: Thread = { worker, ready, pending };
  const fail = (error: Error) => {
    if (thread === current) thread = undefined;
    markFailed(error);
    for (const p of pending.values()) {
      clearTimeout(p.timer);
      p.reject(error);
    }
    pending.clear();
  };
  worker.on('message', (message: { ready?: true; id?: number; result?: unknown; error?: string }) => {
    if (message.ready) return markReady();
    const p = pending.get(message.id!);
    if (!p) return;
    pending.delete(message.id!);
    clearTimeout(p.timer);
    if (pending.size === 0) worker.unref();
    if (message.error !== undefined) p.reject(new Error(message.error));
    else p.resolve(message.result);
  });
  worker.on('error', (error) => fail(error));
  worker.on('exit', (code) => fail(new Error(`The PDF reader stopped (exit code ${code}).`)));
  // Idle, the thread does not keep the process alive; a pending request does (see call()).
  worker.unref();
  return current;
}

function call<T>(operation: Operation): Promise<T> {
  thread ??= startThread();
  const { worker, pending } = thread;
  const id = nextId++;
  return new Promise<T>((resolve, reject) => {
    const timer = setTimeout(() => {
      reject(new Error(`Reading the PDF took longer than ${REQUEST_TIMEOUT_MS / 1000} s.`));
      pending.delete(id);
      void worker.terminate();
    }, REQUEST_TIMEOUT_MS);
    pending.set(id, { resolve: resolve as (value: unknown) => void, reject, timer });
    worker.ref();
    // The bytes move to the thread rather than being copied; callers pass a buffer they no longer need.
    const transfer = 'data' in operation ? [operation.data.buffer as ArrayBuffer] : [];
    worker.postMessage({ id, ...operation }, transfer);
  });
}

/** Starts the thread and loads pdf.js into it (seconds, the first time), ahead of the first upload. */
export async function warmUpPdfReader(): Promise<void> {
  thread ??= startThread();
  await thread.ready;
}

/** Ends the thread, failing anything still pending (shutting down). */
export async function stopPdfReader(): Promise<void> {
  const current = thread;
  thread = undefined;
  await current?.worker.terminate();
}

/**
 * The page count, after loading every page once (so a damaged file fails here); stops early past
 * `maxPages`. Takes `data` over: a buffer of its own moves to the thread and is empty afterwards.
 */
export function countPdfPages(data: Uint8Array, maxPages: number): Promise<number> {
  return call<number>({ op: 'count', data: ownCopy(data), maxPages });
}

export interface OpenPdf {
  pageCount: number;
  /** Plain text of page n (1-based): the text items joined, line ends kept. */
  pageText(n: number): Promise<string>;
  close(): Promise<void>;
}

/** Opens a PDF in the thread for reading page by page; takes `data` over as countPdfPages does. */
export async function openPdf(data: Uint8Array): Promise<OpenPdf> {
  const { doc, pageCount } = await call<{ doc: number; pageCount: number }>({ op: 'open', data: ownCopy(data) });
  return {
    pageCount,
    pageText: (n) => call<string>({ op: 'page', doc, n }),
    close: async () => {
      await call({ op: 'close', doc }).catch(() => {});
    },
  };
}

/** A Uint8Array over its own whole ArrayBuffer, safe to transfer (a Buffer may share Node's pool). */
function ownCopy(data: Uint8Array): Uint8Array {
  return data.byteOffset === 0 && data.byteLength === data.buffer.byteLength && !(data.buffer instanceof SharedArrayBuffer) ? data : data.slice();
}
