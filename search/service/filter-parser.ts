/**
 * Parser for Meilisearch filter expressions (search-api.md §4):
 * NOT > AND > OR, parentheses, comparisons, TO ranges, IN / NOT IN,
 * EXISTS, IS [NOT] NULL, IS [NOT] EMPTY, quoted values with escapes,
 * and the array form (outer AND of inner ORs).
 */
import { ApiError } from './errors';

export type CmpOp = '=' | '!=' | '>' | '>=' | '<' | '<=';
/** An attribute reference with its 1-based span, for error messages. */
export interface AttrRef { name: string; start: number; end: number; src: string }
export type FilterNode =
  | { t: 'and' | 'or'; a: FilterNode[] }
  | { t: 'not'; e: FilterNode }
  | { t: 'cmp'; attr: AttrRef; op: CmpOp; v: string }
  | { t: 'range'; attr: AttrRef; lo: string; hi: string }
  | { t: 'in'; attr: AttrRef; vs: string[] }
  | { t: 'exists' | 'null' | 'empty'; attr: AttrRef };

interface Tok { k: 'word' | 'quoted' | 'op' | 'punct' | 'end'; v: string; start: number; end: number }

const KEYWORDS = new Set(['AND', 'OR', 'NOT', 'TO', 'IN', 'EXISTS', 'IS', 'NULL', 'EMPTY']);
const WORD_CHAR = /[^\s'"()[\],=!<>]/;

function syntaxError(src: string, msg: string, start: number, end: number): ApiError {
  return new ApiError('invalid_search_filter', `${msg}\n${start + 1}:${Math.max(end, start + 1) + 1} ${src}`);
}

function lex(src: string): Tok[] {
  const out: Tok[] = [];
  let i = 0;
  while (i < src.length) {
    const c = src[i];
    if (/\s/.test(c)) { i++; continue; }
    if ('()[],'.includes(c)) { out.push({ k: 'punct', v: c, start: i, end: i + 1 }); i++; continue; }
    if (c === '!' || c === '<' || c === '>' || c === '=') {
      const two = src.slice(i, i + 2);
      if (two === '!=' || two === '>=' || two === '<=') { out.push({ k: 'op', v: two, start: i, end: i + 2 }); i += 2; continue; }
      if (c === '!') throw syntaxError(src, 'Found unexpected characters at the end of the filter: `!`. You probably forgot an `OR` or an `AND` rule.', i, i + 1);
      out.push({ k: 'op', v: c, start: i, end: i + 1 }); i++; continue;
    }
    if (c === '"' || c === "'") {
      let j = i + 1;
      let v = '';
      while (j < src.length && src[j] !== c) {
        if (src[j] === '\\' && j + 1 < src.length && (src[j + 1] === '"' || src[j + 1] === "'" || src[j + 1] === '\\')) { v += src[j + 1]; j += 2; continue; }
        v += src[j++];
      }
      if (j >= src.length) throw syntaxError(src, `Expression \`${src.slice(i)}\` is missing the following closing delimiter: \`${c}\`.`, i, src.length);
      out.push({ k: 'quoted', v, start: i, end: j + 1 });
      i = j + 1;
      continue;
    }
    let j = i;
    while (j < src.length && WORD_CHAR.test(src[j])) j++;
    out.push({ k: 'word', v: src.slice(i, j), start: i, end: j });
    i = j;
  }
  out.push({ k: 'end', v: '', start: src.length, end: src.length });
  return out;
}

const EXPECTING_OP = 'Was expecting an operation `=`, `!=`, `>=`, `>`, `<=`, `<`, `IN`, `NOT IN`, `TO`, `EXISTS`, `NOT EXISTS`, `IS NULL`, `IS NOT NULL`, `IS EMPTY`, `IS NOT EMPTY`, `_geoRadius`, or `_geoBoundingBox`';

class Parser {
  private i = 0;
  private readonly toks: Tok[];
  constructor(private readonly src: string) { this.toks = lex(src); }
  private peek(o = 0): Tok { return this.toks[Math.min(this.i + o, this.toks.length - 1)]; }
  private kw(t: Tok, w: string): boolean { return t.k === 'word' && t.v === w; }
  private fail(msg: string, t: Tok): never { throw syntaxError(this.src, msg, t.start, t.end); }

  parse(): FilterNode {
    const e = this.or();
    const t = this.peek();
    if (t.k !== 'end') this.fail(`Found unexpected characters at the end of the filter: \`${this.src.slice(t.start)}\`. You probably forgot an \`OR\` or an \`AND\` rule.`, t);
    return e;
  }
  private or(): FilterNode {
    const a = [this.and()];
    while (this.kw(this.peek(), 'OR')) { this.i++; a.push(this.and()); }
    return a.length === 1 ? a[0] : { t: 'or', a };
  }
  private and(): FilterNode {
    const a = [this.not()];
    while (this.kw(this.peek(), 'AND')) { this.i++; a.push(this.not()); }
    return a.length === 1 ? a[0] : { t: 'and', a };
  }
  private not(): FilterNode {
    if (this.kw(this.peek(), 'NOT')) { this.i++; return { t: 'not', e: this.not() }; }
    return this.primary();
  }
  /** A value: a quoted string, or a word that is not a keyword. */
  private value(what = 'a value'): Tok {
    const t = this.peek();
    if (t.k === 'quoted' || (t.k === 'word' && !KEYWORDS.has(t.v))) { this.i++; return t; }
    if (t.k === 'end') this.fail(`Was expecting ${what} but instead got nothing.`, t);
    return this.fail(`Was expecting ${what} but instead got \`${t.v}\`.`, t);
  }
  private primary(): FilterNode {
    const t = this.peek();
    if (t.k === 'punct' && t.v === '(') {
      this.i++;
      const e = this.or();
      const c = this.peek();
      if (!(c.k === 'punct' && c.v === ')')) this.fail(`Expression \`${this.src.slice(t.start)}\` is missing the following closing delimiter: \`)\`.`, c);
      this.i++;
      return e;
    }
    if (t.k === 'end') this.fail('Was expecting a value but instead got nothing.', t);
    if (t.k !== 'quoted' && !(t.k === 'word' && !KEYWORDS.has(t.v))) this.fail(`${EXPECTING_OP} at \`${this.src.slice(t.start)}\`.`, t);
    const a = this.value();
    const attr: AttrRef = { name: a.v, start: a.start + 1, end: a.end + 1, src: this.src };
    const n = this.peek();
    if (n.k === 'op') {
      this.i++;
      return { t: 'cmp', attr, op: n.v as CmpOp, v: this.value().v };
    }
    if (this.kw(n, 'IN')) { this.i++; return { t: 'in', attr, vs: this.list() }; }
    if (this.kw(n, 'NOT')) {
      const m = this.peek(1);
      if (this.kw(m, 'IN')) { this.i += 2; return { t: 'not', e: { t: 'in', attr, vs: this.list() } }; }
      if (this.kw(m, 'EXISTS')) { this.i += 2; return { t: 'not', e: { t: 'exists', attr } }; }
      this.fail(`${EXPECTING_OP} at \`${this.src.slice(a.start)}\`.`, a);
    }
    if (this.kw(n, 'EXISTS')) { this.i++; return { t: 'exists', attr }; }
    if (this.kw(n, 'IS')) {
      this.i++;
      let neg = false;
      if (this.kw(this.peek(), 'NOT')) { neg = true; this.i++; }
      const w = this.peek();
      let node: FilterNode;
      if (this.kw(w, 'NULL')) node = { t: 'null', attr };
      else if (this.kw(w, 'EMPTY')) node = { t: 'empty', attr };
      else return this.fail(`${EXPECTING_OP} at \`${this.src.slice(a.start)}\`.`, a);
      this.i++;
      return neg ? { t: 'not', e: node } : node;
    }
    if ((n.k === 'word' && !KEYWORDS.has(n.v)) || n.k === 'quoted') {
      if (this.kw(this.peek(1), 'TO')) {
        const lo = this.value();
        this.i++;
        const hi = this.value();
        return { t: 'range', attr, lo: lo.v, hi: hi.v };
      }
    }
    return this.fail(`${EXPECTING_OP} at \`${this.src.slice(a.start)}\`.`, a);
  }
  private list(): string[] {
    const o = this.peek();
    if (!(o.k === 'punct' && o.v === '[')) this.fail(`Expected \`[\` after \`IN\` keyword.`, o);
    this.i++;
    const vs: string[] = [];
    for (;;) {
      const t = this.peek();
      if (t.k === 'punct' && t.v === ']') { this.i++; return vs; }
      vs.push(this.value().v);
      const s = this.peek();
      if (s.k === 'punct' && s.v === ',') { this.i++; continue; }
      if (s.k === 'punct' && s.v === ']') { this.i++; return vs; }
      this.fail(`Expected matching \`]\` after the list of values.`, s);
    }
  }
}

export function parseFilterString(src: string): FilterNode | null {
  if (src.trim() === '') return null;
  return new Parser(src).parse();
}

/** String or array form (outer AND, inner OR, at most two levels). */
export function parseFilter(f: unknown): FilterNode | null {
  if (f === null || f === undefined) return null;
  if (typeof f === 'string') return parseFilterString(f);
  if (!Array.isArray(f)) throw new ApiError('invalid_search_filter', 'Invalid syntax for the filter parameter: `expected String, Array`, found: `' + JSON.stringify(f) + '`.');
  const ands: FilterNode[] = [];
  for (const el of f) {
    if (typeof el === 'string') { const n = parseFilterString(el); if (n) ands.push(n); continue; }
    if (!Array.isArray(el)) throw new ApiError('invalid_search_filter', 'Invalid syntax for the filter parameter: `expected String, Array`, found: `' + JSON.stringify(el) + '`.');
    const ors: FilterNode[] = [];
    for (const inner of el) {
      if (typeof inner !== 'string') throw new ApiError('invalid_search_filter', 'Invalid syntax for the filter parameter: `expected String`, found: `' + JSON.stringify(inner) + '`.');
      const n = parseFilterString(inner);
      if (n) ors.push(n);
    }
    if (ors.length) ands.push(ors.length === 1 ? ors[0] : { t: 'or', a: ors });
  }
  if (!ands.length) return null;
  return ands.length === 1 ? ands[0] : { t: 'and', a: ands };
}

/** All attribute references, to check them against filterableAttributes before evaluating. */
export function filterAttrs(n: FilterNode, out: AttrRef[] = []): AttrRef[] {
  switch (n.t) {
    case 'and': case 'or': n.a.forEach((x) => filterAttrs(x, out)); break;
    case 'not': filterAttrs(n.e, out); break;
    default: out.push(n.attr);
  }
  return out;
}
