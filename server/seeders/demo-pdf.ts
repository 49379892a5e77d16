import { PDFDocument, StandardFonts, rgb, type PDFFont } from 'pdf-lib';

/** Filler lines per language for pages without a catalogued passage (invented text). */
const filler: Record<string, string[]> = {
  en: ['Item received of the steward for candles and sundries.', 'The company met again upon Thursday and played until late.'],
  fr: ['Le reste de ce chapitre traite de la maniere de tenir l instrument.', 'Suite des comptes du mois precedent.'],
  de: ['Folget die weitere Beschreibung der Instrumente.', 'Summa dieser Seite wie oben.'],
  nl: ['Noch betaelt voor diverse oncosten in de keucken.', 'Somma van dese sijde als boven.'],
  it: ['Seguono altre robbe della guardaroba.', 'Il resto della lettera tratta di affari di famiglia.'],
  la: ['Sequuntur alia capituli negotia.', 'Summa huius paginae ut supra.'],
};

/** Standard fonts encode WinAnsi only: anything else becomes "?" so generation never fails. */
function encodable(font: PDFFont, text: string): string {
  return [...text]
    .map((ch) => {
      try {
        font.encodeText(ch);
        return ch;
      } catch {
        return '?';
      }
    })
    .join('');
}

function wrap(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/)) {
    if ((line + ' ' + word).trim().length > width) {
      lines.push(line);
      line = word;
    } else line = `${line} ${word}`.trim();
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * A fictional facsimile: one PDF page per page of the source, the catalogued passages on
 * their pages, filler in the source's language elsewhere, and a "demo" banner on every page.
 */
export async function demoFacsimilePdf(params: { title: string; language: string; pages: number; passages: Map<number, string[]> }): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`${params.title} (fictional demo facsimile)`);
  doc.setProducer('Windway demo seeder');
  const body = await doc.embedFont(StandardFonts.TimesRoman);
  const small = await doc.embedFont(StandardFonts.Helvetica);
  const lines = filler[params.language] ?? filler.en;
  for (let n = 1; n <= params.pages; n += 1) {
    const page = doc.addPage([420, 595]);
    page.drawText(encodable(small, 'Fictional demo material - not a historical document'), { x: 36, y: 570, size: 8, font: small, color: rgb(0.5, 0.2, 0.2) });
    page.drawText(encodable(small, `${params.title.slice(0, 70)} - [${n}]`), { x: 36, y: 556, size: 8, font: small });
    const text = params.passages.get(n) ?? [lines[n % lines.length]];
    let y = 520;
    for (const paragraph of text) {
      for (const line of wrap(encodable(body, paragraph), 62)) {
        page.drawText(line, { x: 36, y, size: 12, font: body });
        y -= 16;
      }
      y -= 10;
    }
  }
  return doc.save();
}
