/**
 * facetDistribution / facetStats over the matched set, via each facet's
 * per-slot forward index (one pass over matched slots per facet).
 */
import { ApiError } from './errors';
import { attrMatches } from './settings';
import type { SearchIndex } from './index-store';

export function validateFacets(ix: SearchIndex, facets: string[]): string[] {
  const f = ix.settings.filterableAttributes;
  const out: string[] = [];
  for (const name of facets) {
    if (name === '*') { out.push(...f.filter((a) => !a.includes('*') && !out.includes(a))); continue; }
    if (!attrMatches(f, name)) {
      throw new ApiError('invalid_search_facets', `Index \`${ix.uid}\`: Invalid facet distribution: ${f.length ? `Attribute \`${name}\` is not filterable. Available facets are: ${f.map((a) => `\`${a}\``).join(', ')}.` : `Attribute \`${name}\` is not filterable. This index does not have configured filterable attributes.`}`);
    }
    if (!out.includes(name)) out.push(name);
  }
  return out;
}

export function facetDistribution(ix: SearchIndex, names: string[], matched: ArrayLike<number>): { facetDistribution: Record<string, Record<string, number>>; facetStats: Record<string, { min: number; max: number }> } {
  const dist: Record<string, Record<string, number>> = {};
  const stats: Record<string, { min: number; max: number }> = {};
  const { maxValuesPerFacet, sortFacetValuesBy } = ix.settings.faceting;
  for (const name of names) {
    const f = ix.facet(name)!;
    const counts = new Int32Array(f.display.length);
    const single = f.single, multiAt = f.multiAt, multi = f.multiIds.a;
    for (let i = 0; i < matched.length; i++) {
      const s = matched[i];
      const id = single[s];
      if (id >= 0) counts[id]++;
      else if (id === -2) { const at = multiAt[s], end = at + 1 + multi[at]; for (let j = at + 1; j < end; j++) counts[multi[j]]++; }
    }
    const ids: number[] = [];
    let min = Infinity, max = -Infinity;
    for (let id = 0; id < counts.length; id++) {
      if (!counts[id]) continue;
      ids.push(id);
      const v = f.numeric[id];
      if (!Number.isNaN(v)) { if (v < min) min = v; if (v > max) max = v; }
    }
    // Alphabetical: numbers first in numeric order, then strings bytewise on their lower-cased form.
    const alpha = (a: number, b: number) => {
      const na = f.numeric[a], nb = f.numeric[b];
      const ia = Number.isNaN(na), ib = Number.isNaN(nb);
      if (!ia && !ib) return na - nb;
      if (ia !== ib) return ia ? 1 : -1;
      const sa = f.lower[a]!, sb = f.lower[b]!;
      return sa < sb ? -1 : sa > sb ? 1 : 0;
    };
    const how = sortFacetValuesBy[name] ?? sortFacetValuesBy['*'] ?? 'alpha';
    ids.sort(how === 'count' ? (a, b) => counts[b] - counts[a] || alpha(a, b) : alpha);
    const out: Record<string, number> = {};
    for (const id of ids.slice(0, maxValuesPerFacet)) out[String(f.display[id])] = counts[id];
    dist[name] = out;
    if (min <= max) stats[name] = { min, max };
  }
  return { facetDistribution: dist, facetStats: stats };
}
