/** Programme exports: print-ready HTML, Markdown (with rendered footnotes) and BibTeX of everything cited. */
import type { Programme } from '../../models/programme';
import { fingeringText, rangeText, reckonPiece } from '@shared/programmes/pieces';
import { toBibtex } from './format';
import { toCitable } from './load';
import { escapeText, htmlToText, renderNotes, type RenderedNotes } from './programme';

export const PRINT_CSS = `
  @page { size: A4; margin: 20mm 18mm 22mm; }
  :root { color: #1d1a16; background: #fbf8f1; }
  body { font-family: "EB Garamond", Garamond, "Times New Roman", serif; font-size: 12pt; line-height: 1.5; max-width: 42rem; margin: 2rem auto; padding: 0 1rem; }
  h1 { font-size: 1.8rem; margin: 0 0 .25rem; } h2 { font-size: 1.2rem; margin-top: 2rem; border-bottom: 1px solid #d9cfbd; }
  .meta { color: #4a4238; margin: 0 0 1.5rem; } .performers { list-style: none; padding: 0; }
  table.pieces { border-collapse: collapse; width: 100%; font-size: 10.5pt; font-variant-numeric: tabular-nums; }
  table.pieces th, table.pieces td { border-bottom: 1px solid #e4dccd; padding: .3rem .4rem; text-align: left; vertical-align: top; }
  .cross { font-weight: 600; } .misfit { font-style: italic; }
  sup.footnote-ref a { text-decoration: none; color: inherit; }
  .footnotes ol { padding-left: 1.5rem; font-size: 10.5pt; } .bibliography p { padding-left: 2em; text-indent: -2em; margin: .2rem 0; font-size: 10.5pt; }
  mark.citation-problem { background: none; text-decoration: underline wavy #b3261e; }
  @media print { :root, body { background: #fff; } body { margin: 0; max-width: none; } a { color: inherit; text-decoration: none; }
    h2 { break-after: avoid; } tr, .footnotes li, .bibliography p { break-inside: avoid; } }
`;

function piecesRows(programme: Programme) {
  return programme.pieces.map((piece) => {
    const r = reckonPiece(piece);
    return { piece, r, fingering: fingeringText(piece, r), range: rangeText(r) };
  });
}

function metaLine(programme: Programme): string {
  return [programme.performanceDate, programme.venue].filter(Boolean).join(' · ');
}

export async function programmeHtml(programme: Programme, rendered?: RenderedNotes): Promise<string> {
  const notes = rendered ?? (await renderNotes(programme.notesMarkdown, programme.citationStyle));
  const rows = piecesRows(programme)
    .map(({ piece, r, fingering, range }) =>
      `<tr><td>${escapeText(piece.title)}</td><td>${escapeText(piece.composer ?? '')}</td><td>${escapeText(piece.key)}</td>` +
      `<td>${escapeText(r.sizeName)}, a′ = ${piece.aHz} Hz</td><td class="${r.crossFingered ? 'cross' : ''}">${escapeText(fingering)}</td>` +
      `<td class="${r.range && !r.range.fits ? 'misfit' : ''}">${escapeText(range)}</td></tr>`,
    )
    .join('\n');
  const performers = programme.performers.map((p) => `<li>${escapeText(p.name)}${p.role ? `, ${escapeText(p.role)}` : ''}</li>`).join('');
  const footnotes =
    notes.styleKind === 'note' && notes.notes.length
      ? `<section class="footnotes"><h2>Notes</h2><ol>${notes.notes.map((n) => `<li id="fn-${n.number}">${n.html} <a href="#fnref-${n.number}" aria-label="Back to the text">↩</a></li>`).join('')}</ol></section>`
      : '';
  const bibliography = notes.bibliography.length
    ? `<section class="bibliography"><h2>${notes.styleKind === 'note' ? 'Bibliography' : 'References'}</h2>${notes.bibliography.map((b) => `<p>${b.html}</p>`).join('')}</section>`
    : '';
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeText(programme.title)}</title><style>${PRINT_CSS}</style></head>
<body><header><h1>${escapeText(programme.title)}</h1><p class="meta">${escapeText(metaLine(programme))}</p>${performers ? `<ul class="performers">${performers}</ul>` : ''}</header>
${rows ? `<section><h2>Programme</h2><table class="pieces"><thead><tr><th>Piece</th><th>Composer</th><th>Sounding key</th><th>Instrument</th><th>Fingering</th><th>Range</th></tr></thead><tbody>${rows}</tbody></table></section>` : ''}
<article class="notes">${notes.html}</article>
${footnotes}
${bibliography}
</body></html>
`;
}

/**
 * Markdown that reads correctly anywhere: Pandoc/GFM footnotes `[^n]` with the formatted notes,
 * and the bibliography. The `.bib` export (programmeBib) holds every cited id as a key, so the
 * original notes with their markers also work with `pandoc --citeproc --bibliography`.
 */
export async function programmeMarkdown(programme: Programme, rendered?: RenderedNotes): Promise<string> {
  const notes = rendered ?? (await renderNotes(programme.notesMarkdown, programme.citationStyle));
  const lines: string[] = [`# ${programme.title}`, ''];
  const meta = metaLine(programme);
  if (meta) lines.push(meta, '');
  for (const p of programme.performers) lines.push(`- ${p.name}${p.role ? `, ${p.role}` : ''}`);
  if (programme.performers.length) lines.push('');
  const rows = piecesRows(programme);
  if (rows.length) {
    lines.push('## Programme', '', '| Piece | Composer | Sounding key | Instrument | Fingering | Range |', '|---|---|---|---|---|---|');
    const cell = (s: string) => s.replace(/\|/g, '\\|');
    for (const { piece, r, fingering, range } of rows) {
      lines.push(`| ${cell(piece.title)} | ${cell(piece.composer ?? '')} | ${cell(piece.key)} | ${cell(r.sizeName)}, a′ = ${piece.aHz} Hz | ${cell(fingering)} | ${cell(range)} |`);
    }
    lines.push('');
  }
  const body = notes.tokenised
    .replace(/⟦(\d+)⟧/g, (_m, n: string) => (notes.styleKind === 'note' ? `[^${n}]` : `${notes.inline[Number(n) - 1] ?? ''}`))
    .replace(/⟦!(\d+)⟧/g, (_m, k: string) => notes.marked[Number(k)]?.raw ?? '');
  lines.push(body.trim(), '');
  if (notes.styleKind === 'note') for (const n of notes.notes) lines.push(`[^${n.number}]: ${n.text}`);
  if (notes.bibliography.length) {
    lines.push('', `## ${notes.styleKind === 'note' ? 'Bibliography' : 'References'}`, '');
    for (const b of notes.bibliography) lines.push(b.text, '');
  }
  return lines.join('\n').replace(/\n{3,}/g, '\n\n').trimEnd() + '\n';
}

/** BibTeX of every id cited (excerpts as their own entries, keyed by their ids). */
export async function programmeBib(programme: Programme, rendered?: RenderedNotes): Promise<string> {
  const notes = rendered ?? (await renderNotes(programme.notesMarkdown, programme.citationStyle));
  const citables = [...notes.targets.values()].map((t) => toCitable(t));
  return citables.length ? toBibtex(citables) : '';
}

export { htmlToText };
