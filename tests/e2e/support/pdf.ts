import { mkdirSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { PDFDocument, StandardFonts, rgb } from 'pdf-lib';

export const artifactsDir = resolve(import.meta.dirname, '../../.artifacts');

/**
 * A fictional facsimile: `pages` pages, each headed with its folio (1r, 1v, 2r, …) and a few
 * lines of text, so text extraction has something to find on every page.
 */
export async function facsimilePdf(options: { title: string; pages?: number; marker?: string }): Promise<Uint8Array> {
  const pages = options.pages ?? 40;
  const pdf = await PDFDocument.create();
  pdf.setTitle(options.title);
  pdf.setProducer('Windway end-to-end tests');
  const font = await pdf.embedFont(StandardFonts.TimesRoman);
  const bold = await pdf.embedFont(StandardFonts.TimesRomanBold);
  for (let n = 1; n <= pages; n += 1) {
    const page = pdf.addPage([420, 595]);
    const folio = `${Math.ceil(n / 2)}${n % 2 === 1 ? 'r' : 'v'}`;
    page.drawRectangle({ x: 20, y: 20, width: 380, height: 555, borderColor: rgb(0.55, 0.45, 0.3), borderWidth: 1, color: rgb(0.98, 0.95, 0.88) });
    page.drawText(`fol. ${folio}`, { x: 340, y: 550, size: 11, font });
    page.drawText(options.title.slice(0, 48), { x: 40, y: 520, size: 13, font: bold });
    const lines = [
      `Page ${n} of ${pages} of a fictional document made for testing.`,
      options.marker ? `Marker ${options.marker} on page ${n}.` : `Nothing of note on page ${n}.`,
      'Of the flute a bec and its sizes, the voice flute being',
      'a minor third below the common flute, at the low pitch',
      'of the chamber, a semitone below the modern.',
    ];
    lines.forEach((line, i) => page.drawText(line, { x: 40, y: 480 - i * 18, size: 11, font, color: rgb(0.15, 0.12, 0.1) }));
  }
  return pdf.save();
}

/** Writes the PDF under tests/.artifacts (git-ignored) and returns its path, for file inputs. */
export async function writeFacsimilePdf(name: string, options: Parameters<typeof facsimilePdf>[0]): Promise<string> {
  const dir = resolve(artifactsDir, 'files');
  mkdirSync(dir, { recursive: true });
  const path = resolve(dir, name);
  writeFileSync(path, await facsimilePdf(options));
  return path;
}
