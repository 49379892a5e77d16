/**
 * DOCX with real footnotes (docx 9: the document's `footnotes` and FootnoteReferenceRun), the
 * pieces table with the reckoner's results, and the bibliography with hanging indents.
 * In-text styles put the citation in the running text instead of a footnote.
 */
import {
  AlignmentType, Document, FootnoteReferenceRun, HeadingLevel, Packer, Paragraph, Table, TableCell, TableRow, TextRun, WidthType,
  type ParagraphChild,
} from 'docx';
import { marked, type Token, type Tokens } from 'marked';
import type { Programme } from '../../models/programme';
import { fingeringText, rangeText, reckonPiece } from '@shared/programmes/pieces';
import { htmlToText, renderNotes, type RenderedNotes } from './programme';

interface RunStyle {
  bold?: boolean;
  italics?: boolean;
}

/** citeproc's inline HTML (italic titles, small caps) → text runs. */
export function htmlRuns(html: string, base: RunStyle = {}): TextRun[] {
  const runs: TextRun[] = [];
  let italics = !!base.italics;
  let bold = !!base.bold;
  for (const part of html.split(/(<\/?(?:i|em|b|strong)>)/)) {
    if (/^<(i|em)>$/.test(part)) italics = true;
    else if (/^<\/(i|em)>$/.test(part)) italics = !!base.italics;
    else if (/^<(b|strong)>$/.test(part)) bold = true;
    else if (/^<\/(b|strong)>$/.test(part)) bold = !!base.bold;
    else if (part) {
      const text = htmlToText(part);
      if (text) runs.push(new TextRun({ text, italics, bold }));
    }
  }
  return runs;
}

/** Plain text with ⟦n⟧ tokens → runs with footnote references (or in-text citations). */
function textWithRefs(text: string, style: RunStyle, notes: RenderedNotes): ParagraphChild[] {
  const out: ParagraphChild[] = [];
  for (const part of text.split(/(⟦!?\d+⟧)/)) {
    const note = /^⟦(\d+)⟧$/.exec(part);
    const problem = /^⟦!(\d+)⟧$/.exec(part);
    if (note) {
      if (notes.styleKind === 'note') out.push(new FootnoteReferenceRun(Number(note[1])));
      else out.push(...htmlRuns(notes.notes[Number(note[1]) - 1]?.html ?? '', style));
    } else if (problem) {
      out.push(new TextRun({ text: notes.marked[Number(problem[1])]?.raw ?? '', ...style, underline: {} }));
    } else if (part) {
      out.push(new TextRun({ text: part, ...style }));
    }
  }
  return out;
}

function inlineRuns(tokens: Token[] | undefined, style: RunStyle, notes: RenderedNotes): ParagraphChild[] {
  const out: ParagraphChild[] = [];
  for (const token of tokens ?? []) {
    switch (token.type) {
      case 'strong':
        out.push(...inlineRuns((token as Tokens.Strong).tokens, { ...style, bold: true }, notes));
        break;
      case 'em':
        out.push(...inlineRuns((token as Tokens.Em).tokens, { ...style, italics: true }, notes));
        break;
      case 'link':
        out.push(...inlineRuns((token as Tokens.Link).tokens, style, notes));
        break;
      case 'br':
        out.push(new TextRun({ text: '', break: 1 }));
        break;
      case 'text': {
        const t = token as Tokens.Text;
        if (t.tokens?.length) out.push(...inlineRuns(t.tokens, style, notes));
        else out.push(...textWithRefs(htmlToText(t.text), style, notes));
        break;
      }
      default:
        out.push(...textWithRefs(htmlToText('text' in token ? String(token.text) : token.raw), style, notes));
    }
  }
  return out;
}

function blockParagraphs(tokens: Token[], notes: RenderedNotes): Paragraph[] {
  const out: Paragraph[] = [];
  for (const token of tokens) {
    if (token.type === 'heading') {
      const h = token as Tokens.Heading;
      out.push(new Paragraph({ heading: h.depth <= 2 ? HeadingLevel.HEADING_2 : HeadingLevel.HEADING_3, children: inlineRuns(h.tokens, {}, notes) }));
    } else if (token.type === 'paragraph') {
      out.push(new Paragraph({ children: inlineRuns((token as Tokens.Paragraph).tokens, {}, notes), spacing: { after: 160 } }));
    } else if (token.type === 'list') {
      for (const item of (token as Tokens.List).items) {
        const inner = item.tokens.flatMap((t) => ('tokens' in t && t.tokens ? t.tokens : [t]));
        out.push(new Paragraph({ bullet: { level: 0 }, children: inlineRuns(inner, {}, notes) }));
      }
    } else if (token.type === 'blockquote') {
      for (const p of blockParagraphs((token as Tokens.Blockquote).tokens, notes)) out.push(p);
    } else if (token.type !== 'space' && token.type !== 'hr') {
      out.push(new Paragraph({ children: textWithRefs(htmlToText(token.raw), {}, notes) }));
    }
  }
  return out;
}

function cell(text: string, style: RunStyle = {}): TableCell {
  return new TableCell({ children: [new Paragraph({ children: [new TextRun({ text, ...style })] })] });
}

function piecesTable(programme: Programme): Table {
  const header = ['Piece', 'Composer', 'Sounding key', 'Instrument', 'Fingering', 'Range'].map((h) => cell(h, { bold: true }));
  const rows = programme.pieces.map((piece) => {
    const r = reckonPiece(piece);
    return new TableRow({
      children: [
        cell(piece.title), cell(piece.composer ?? ''), cell(piece.key), cell(`${r.sizeName}, a′ = ${piece.aHz} Hz`),
        cell(fingeringText(piece, r), { bold: r.crossFingered }), cell(rangeText(r), { italics: !!r.range && !r.range.fits }),
      ],
    });
  });
  return new Table({ width: { size: 100, type: WidthType.PERCENTAGE }, rows: [new TableRow({ children: header, tableHeader: true }), ...rows] });
}

export async function programmeDocx(programme: Programme, rendered?: RenderedNotes): Promise<Buffer> {
  const notes = rendered ?? (await renderNotes(programme.notesMarkdown, programme.citationStyle));
  const footnotes: Record<number, { children: Paragraph[] }> = {};
  if (notes.styleKind === 'note') for (const n of notes.notes) footnotes[n.number] = { children: [new Paragraph({ children: htmlRuns(n.html) })] };

  const children: (Paragraph | Table)[] = [new Paragraph({ heading: HeadingLevel.TITLE, children: [new TextRun(programme.title)] })];
  const meta = [programme.performanceDate, programme.venue].filter(Boolean).join(' · ');
  if (meta) children.push(new Paragraph({ children: [new TextRun({ text: meta, italics: true })] }));
  for (const p of programme.performers) children.push(new Paragraph({ children: [new TextRun(`${p.name}${p.role ? `, ${p.role}` : ''}`)] }));
  if (programme.pieces.length) {
    children.push(new Paragraph({ heading: HeadingLevel.HEADING_1, children: [new TextRun('Programme')] }), piecesTable(programme));
  }
  children.push(...blockParagraphs(marked.lexer(notes.tokenised), notes));
  if (notes.bibliography.length) {
    children.push(new Paragraph({ heading: HeadingLevel.HEADING_1, children: [new TextRun(notes.styleKind === 'note' ? 'Bibliography' : 'References')] }));
    for (const b of notes.bibliography) {
      children.push(new Paragraph({ alignment: AlignmentType.LEFT, indent: { left: 720, hanging: 720 }, children: htmlRuns(b.html) }));
    }
  }
  const doc = new Document({
    creator: 'Windway',
    title: programme.title,
    styles: { default: { document: { run: { font: 'Garamond', size: 24 } } } },
    footnotes,
    sections: [{ children }],
  });
  return Packer.toBuffer(doc);
}
