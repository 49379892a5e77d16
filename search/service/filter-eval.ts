/**
 * Evaluates a parsed filter to a bitset of live slots using the per-attribute
 * facet structures. Negations (`NOT`, `!=`, `NOT IN`) are complements within
 * the live documents, so they also match documents lacking the attribute.
 */
import { ApiError } from './errors';
import { filterAttrs, type FilterNode, type AttrRef } from './filter-parser';
import { attrMatches } from './settings';
import type { SearchIndex } from './index-store';
import { Bitset } from './structs';
import type { FacetField } from './facet-index';

const list = (xs: string[]) => xs.map((x) => `\`${x}\``).join(', ');

export function notFilterableMessage(ix: SearchIndex, attr: string): string {
  const f = ix.settings.filterableAttributes;
  return f.length
    ? `Index \`${ix.uid}\`: Attribute \`${attr}\` is not filterable. Available filterable attribute patterns are: ${list(f)}.`
    : `Index \`${ix.uid}\`: Attribute \`${attr}\` is not filterable. This index does not have configured filterable attributes.`;
}

/** Rejects filters naming attributes outside filterableAttributes, with the span like Meilisearch. */
export function checkFilterable(ix: SearchIndex, node: FilterNode): void {
  for (const a of filterAttrs(node)) {
    if (!attrMatches(ix.settings.filterableAttributes, a.name)) {
      throw new ApiError('invalid_search_filter', `${notFilterableMessage(ix, a.name)}\n${a.start}:${a.end} ${a.src}`);
    }
  }
}

function field(ix: SearchIndex, a: AttrRef): FacetField {
  const f = ix.facet(a.name);
  if (!f) throw new ApiError('invalid_search_filter', `${notFilterableMessage(ix, a.name)}\n${a.start}:${a.end} ${a.src}`);
  return f;
}

/**
 * Leaf results (`visibility = "public"` is in every app query; a multi-search
 * repeats the same clauses) cached per index version; callers get a copy,
 * since evaluation combines bitsets in place.
 */
const leafCache = new WeakMap<SearchIndex, { version: number; map: Map<string, Bitset> }>();

function leafKey(n: FilterNode): string | null {
  const q = (v: string) => JSON.stringify(v);
  switch (n.t) {
    case 'cmp': return `${q(n.attr.name)} ${n.op} ${q(n.v)}`;
    case 'range': return `${q(n.attr.name)} ${q(n.lo)} TO ${q(n.hi)}`;
    case 'in': return `${q(n.attr.name)} IN ${q(n.vs.join('\u0000'))}`;
    case 'exists': case 'null': case 'empty': return `${q(n.attr.name)} ${n.t}`;
    default: return null;
  }
}

export function evalFilter(ix: SearchIndex, n: FilterNode): Bitset {
  const key = leafKey(n);
  if (key === null) return evalNode(ix, n);
  let c = leafCache.get(ix);
  if (!c || c.version !== ix.version) { c = { version: ix.version, map: new Map() }; leafCache.set(ix, c); }
  let b = c.map.get(key);
  if (!b) {
    b = evalNode(ix, n);
    if (c.map.size >= 256) c.map.clear();
    c.map.set(key, b);
  }
  return b.clone();
}

function evalNode(ix: SearchIndex, n: FilterNode): Bitset {
  const size = ix.slots;
  switch (n.t) {
    case 'and': {
      const r = evalFilter(ix, n.a[0]);
      for (let i = 1; i < n.a.length; i++) r.andInPlace(evalFilter(ix, n.a[i]));
      return r;
    }
    case 'or': {
      const r = evalFilter(ix, n.a[0]);
      for (let i = 1; i < n.a.length; i++) r.orInPlace(evalFilter(ix, n.a[i]));
      return r;
    }
    case 'not': return ix.alive.clone().andNotInPlace(evalFilter(ix, n.e));
    case 'cmp': {
      const f = field(ix, n.attr);
      let r: Bitset;
      switch (n.op) {
        case '=': r = f.equal(size, n.v); break;
        case '!=': return ix.alive.clone().andNotInPlace(f.equal(size, n.v));
        case '>': r = f.range(size, n.v, false, null, true); break;
        case '>=': r = f.range(size, n.v, true, null, true); break;
        case '<': r = f.range(size, null, true, n.v, false); break;
        case '<=': r = f.range(size, null, true, n.v, true); break;
      }
      return r.andInPlace(ix.alive);
    }
    case 'range': return field(ix, n.attr).range(size, n.lo, true, n.hi, true).andInPlace(ix.alive);
    case 'in': {
      const f = field(ix, n.attr);
      const r = new Bitset(size);
      for (const v of n.vs) r.orInPlace(f.equal(size, v));
      return r.andInPlace(ix.alive);
    }
    case 'exists': { const f = field(ix, n.attr); return f.slotsOf(f.exists, size).andInPlace(ix.alive); }
    case 'null': { const f = field(ix, n.attr); return f.slotsOf(f.nulls, size).andInPlace(ix.alive); }
    case 'empty': { const f = field(ix, n.attr); return f.slotsOf(f.empties, size).andInPlace(ix.alive); }
  }
}
