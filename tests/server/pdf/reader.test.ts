/**
 * The PDF reader runs pdf.js in a worker thread (server/pdf/reader.ts). Its legacy build
 * replaces built-ins with core-js polyfills wherever it is imported; these tests keep it
 * off the main thread, and show the thread recovers after it is stopped.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { countPdfPages, openPdf, stopPdfReader } from '@server/pdf/reader';
import { makePdf } from '../../fixtures/pdf';

afterAll(() => stopPdfReader());

describe('PDF reader', () => {
  it('counts pages and reads each page’s text', async () => {
    expect(await countPdfPages(new Uint8Array(await makePdf(3)), 100)).toBe(3);
    const pdf = await openPdf(new Uint8Array(await makePdf(2, (p) => `Folio ${p}: Handflöte`)));
    expect(pdf.pageCount).toBe(2);
    expect(await pdf.pageText(2)).toBe('Folio 2: Handflöte');
    await pdf.close();
  });

  it('stops counting past the limit, and refuses a damaged file with pdf.js’s reason', async () => {
    expect(await countPdfPages(new Uint8Array(await makePdf(12)), 5)).toBe(12);
    const truncated = (await makePdf(2)).subarray(0, 400);
    await expect(countPdfPages(new Uint8Array(truncated), 100)).rejects.toThrow(/\w+/);
  });

  // core-js disguises its polyfills' source as native, so this looks for pdf.js itself:
  // its main module announces itself as globalThis.pdfjsLib wherever it is evaluated.
  it('keeps pdf.js (and its polyfills of built-ins) out of the main thread', async () => {
    // The whole server: the app, its routes and services, and the background jobs.
    await import('@server/app');
    await import('@server/background');
    await countPdfPages(new Uint8Array(await makePdf(1)), 10);
    expect((globalThis as { pdfjsLib?: unknown }).pdfjsLib).toBeUndefined();
  });

  it('starts a new thread after the last one was stopped, and serves requests side by side', async () => {
    await stopPdfReader();
    const counts = await Promise.all([1, 2, 3, 4].map(async (n) => countPdfPages(new Uint8Array(await makePdf(n)), 10)));
    expect(counts).toEqual([1, 2, 3, 4]);
  });
});
