/**
 * Index settings: defaults, PATCH semantics (only sent fields change, `null`
 * resets) and validation with Meilisearch's `invalid_settings_*` codes.
 */
import { ApiError, describeValue } from './errors';

export interface TypoTolerance {
  enabled: boolean;
  minWordSizeForTypos: { oneTypo: number; twoTypos: number };
  disableOnWords: string[];
  disableOnAttributes: string[];
  disableOnNumbers: boolean;
}

export interface Settings {
  displayedAttributes: string[];
  searchableAttributes: string[];
  filterableAttributes: string[];
  sortableAttributes: string[];
  synonyms: Record<string, string[]>;
  stopWords: string[];
  typoTolerance: TypoTolerance;
  faceting: { maxValuesPerFacet: number; sortFacetValuesBy: Record<string, 'alpha' | 'count'> };
  pagination: { maxTotalHits: number };
}

export function defaultSettings(): Settings {
  return {
    displayedAttributes: ['*'],
    searchableAttributes: ['*'],
    filterableAttributes: [],
    sortableAttributes: [],
    synonyms: {},
    stopWords: [],
    typoTolerance: { enabled: true, minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 }, disableOnWords: [], disableOnAttributes: [], disableOnNumbers: false },
    faceting: { maxValuesPerFacet: 100, sortFacetValuesBy: { '*': 'alpha' } },
    pagination: { maxTotalHits: 1000 },
  };
}

/** The GET /settings body: our settings plus the fixed values of settings this service does not implement. */
export function settingsView(s: Settings): Record<string, unknown> {
  return {
    displayedAttributes: s.displayedAttributes,
    searchableAttributes: s.searchableAttributes,
    filterableAttributes: s.filterableAttributes,
    sortableAttributes: s.sortableAttributes,
    rankingRules: ['words', 'typo', 'proximity', 'attribute', 'sort', 'exactness'],
    stopWords: s.stopWords,
    nonSeparatorTokens: [],
    separatorTokens: [],
    dictionary: [],
    synonyms: s.synonyms,
    distinctAttribute: null,
    proximityPrecision: 'byWord',
    typoTolerance: s.typoTolerance,
    faceting: s.faceting,
    pagination: s.pagination,
    searchCutoffMs: null,
    localizedAttributes: null,
    facetSearch: true,
    prefixSearch: 'indexingTime',
    embedders: {},
  };
}

/** kebab-case sub-routes (`/settings/filterable-attributes`) → settings field. */
export const SUB_ROUTES: Record<string, keyof Settings> = {
  'displayed-attributes': 'displayedAttributes',
  'searchable-attributes': 'searchableAttributes',
  'filterable-attributes': 'filterableAttributes',
  'sortable-attributes': 'sortableAttributes',
  synonyms: 'synonyms',
  'stop-words': 'stopWords',
  'typo-tolerance': 'typoTolerance',
  faceting: 'faceting',
  pagination: 'pagination',
};

const snake = (k: string) => k.replace(/[A-Z]/g, (c) => '_' + c.toLowerCase());
const bad = (field: string, path: string, expected: string, v: unknown) =>
  new ApiError(`invalid_settings_${snake(field)}`, `Invalid value type at \`.${path}\`: expected ${expected}, but found ${describeValue(v)}`);

function stringArray(field: string, v: unknown): string[] {
  if (!Array.isArray(v)) throw bad(field, field, 'an array', v);
  return v.map((x, i) => {
    if (typeof x !== 'string') throw bad(field, `${field}[${i}]`, 'a string', x);
    return x;
  });
}

/** Filterable attributes may also be given as `{attributePatterns: [...]}` objects (Meilisearch ≥ 1.14). */
function filterables(v: unknown): string[] {
  if (!Array.isArray(v)) throw bad('filterableAttributes', 'filterableAttributes', 'an array', v);
  const out: string[] = [];
  for (const x of v) {
    if (typeof x === 'string') out.push(x);
    else if (x && typeof x === 'object' && Array.isArray((x as { attributePatterns?: unknown }).attributePatterns)) out.push(...stringArray('filterableAttributes', (x as { attributePatterns: unknown }).attributePatterns));
    else throw bad('filterableAttributes', 'filterableAttributes', 'a string or an object', x);
  }
  return out;
}

function int(field: string, path: string, v: unknown, min = 0): number {
  if (typeof v !== 'number' || !Number.isInteger(v) || v < min) throw bad(field, path, 'a positive integer', v);
  return v;
}

function obj(field: string, v: unknown): Record<string, unknown> {
  if (!v || typeof v !== 'object' || Array.isArray(v)) throw bad(field, field, 'an object', v);
  return v as Record<string, unknown>;
}

function only(field: string, o: Record<string, unknown>, keys: string[]): void {
  for (const k of Object.keys(o)) {
    if (!keys.includes(k)) throw new ApiError(`invalid_settings_${snake(field)}`, `Unknown field \`${k}\` inside \`.${field}\`: expected one of ${keys.map((x) => `\`${x}\``).join(', ')}`);
  }
}

const SUPPORTED = ['displayedAttributes', 'searchableAttributes', 'filterableAttributes', 'sortableAttributes', 'synonyms', 'stopWords', 'typoTolerance', 'faceting', 'pagination'];
/** Settings a real Meilisearch knows; accepted when they equal the value we report, refused otherwise. */
const KNOWN_FIXED = ['rankingRules', 'nonSeparatorTokens', 'separatorTokens', 'dictionary', 'distinctAttribute', 'proximityPrecision', 'searchCutoffMs', 'localizedAttributes', 'facetSearch', 'prefixSearch', 'embedders'];

/** Validates a PATCH body; throws an ApiError (used synchronously at enqueue time). */
export function validateSettingsPatch(body: unknown): Record<string, unknown> {
  const p = obj('settings', body);
  for (const k of Object.keys(p)) {
    if (SUPPORTED.includes(k) || KNOWN_FIXED.includes(k)) continue;
    throw new ApiError('bad_request', `Unknown field \`${k}\`: expected one of ${[...SUPPORTED, ...KNOWN_FIXED].map((x) => `\`${x}\``).join(', ')}`);
  }
  applySettingsPatch(defaultSettings(), p);
  return p;
}

/** Applies a patch; returns which derived structures must be rebuilt. */
export function applySettingsPatch(s: Settings, p: Record<string, unknown>): { reindex: boolean } {
  const d = defaultSettings();
  let reindex = false;
  for (const [k, v] of Object.entries(p)) {
    if (KNOWN_FIXED.includes(k)) {
      if (v === null) continue;
      const fixed = settingsView(d)[k];
      if (JSON.stringify(fixed) !== JSON.stringify(v)) throw new ApiError('bad_request', `The local search service does not support changing \`${k}\`.`);
      continue;
    }
    switch (k) {
      case 'displayedAttributes': s.displayedAttributes = v === null ? d.displayedAttributes : stringArray(k, v); break;
      case 'searchableAttributes': s.searchableAttributes = v === null ? d.searchableAttributes : stringArray(k, v); reindex = true; break;
      case 'filterableAttributes': s.filterableAttributes = v === null ? d.filterableAttributes : filterables(v); reindex = true; break;
      case 'sortableAttributes': s.sortableAttributes = v === null ? d.sortableAttributes : stringArray(k, v); reindex = true; break;
      case 'stopWords': s.stopWords = v === null ? d.stopWords : stringArray(k, v); break;
      case 'synonyms': {
        if (v === null) { s.synonyms = d.synonyms; break; }
        const o = obj(k, v);
        const out: Record<string, string[]> = {};
        for (const [key, list] of Object.entries(o)) out[key] = stringArray(k, list);
        s.synonyms = out;
        break;
      }
      case 'typoTolerance': {
        if (v === null) { s.typoTolerance = d.typoTolerance; break; }
        const o = obj(k, v);
        only(k, o, ['enabled', 'minWordSizeForTypos', 'disableOnWords', 'disableOnAttributes', 'disableOnNumbers']);
        const t = { ...s.typoTolerance, minWordSizeForTypos: { ...s.typoTolerance.minWordSizeForTypos } };
        if ('enabled' in o) { if (o.enabled === null) t.enabled = true; else if (typeof o.enabled !== 'boolean') throw bad(k, 'typoTolerance.enabled', 'a boolean', o.enabled); else t.enabled = o.enabled; }
        if ('disableOnNumbers' in o) { if (o.disableOnNumbers === null) t.disableOnNumbers = false; else if (typeof o.disableOnNumbers !== 'boolean') throw bad(k, 'typoTolerance.disableOnNumbers', 'a boolean', o.disableOnNumbers); else t.disableOnNumbers = o.disableOnNumbers; }
        if ('disableOnWords' in o) t.disableOnWords = o.disableOnWords === null ? [] : stringArray(k, o.disableOnWords);
        if ('disableOnAttributes' in o) t.disableOnAttributes = o.disableOnAttributes === null ? [] : stringArray(k, o.disableOnAttributes);
        if ('minWordSizeForTypos' in o) {
          if (o.minWordSizeForTypos === null) t.minWordSizeForTypos = { oneTypo: 5, twoTypos: 9 };
          else {
            const m = obj(k, o.minWordSizeForTypos);
            only(k, m, ['oneTypo', 'twoTypos']);
            if ('oneTypo' in m) t.minWordSizeForTypos.oneTypo = m.oneTypo === null ? 5 : int(k, 'typoTolerance.minWordSizeForTypos.oneTypo', m.oneTypo);
            if ('twoTypos' in m) t.minWordSizeForTypos.twoTypos = m.twoTypos === null ? 9 : int(k, 'typoTolerance.minWordSizeForTypos.twoTypos', m.twoTypos);
            if (t.minWordSizeForTypos.oneTypo > t.minWordSizeForTypos.twoTypos) {
              throw new ApiError('invalid_settings_typo_tolerance', '`minWordSizeForTypos` setting is invalid. `oneTypo` and `twoTypos` fields should be between `0` and `255`, and `twoTypos` should be greater or equals to `oneTypo` but found `oneTypo: ' + t.minWordSizeForTypos.oneTypo + '` and twoTypos: `' + t.minWordSizeForTypos.twoTypos + '`.');
            }
          }
        }
        s.typoTolerance = t;
        break;
      }
      case 'faceting': {
        if (v === null) { s.faceting = d.faceting; break; }
        const o = obj(k, v);
        only(k, o, ['maxValuesPerFacet', 'sortFacetValuesBy']);
        const f = { ...s.faceting };
        if ('maxValuesPerFacet' in o) f.maxValuesPerFacet = o.maxValuesPerFacet === null ? 100 : int(k, 'faceting.maxValuesPerFacet', o.maxValuesPerFacet);
        if ('sortFacetValuesBy' in o) {
          if (o.sortFacetValuesBy === null) f.sortFacetValuesBy = { '*': 'alpha' };
          else {
            const m = obj(k, o.sortFacetValuesBy);
            const out: Record<string, 'alpha' | 'count'> = { '*': 'alpha' };
            for (const [a, how] of Object.entries(m)) {
              if (how !== 'alpha' && how !== 'count') throw bad(k, `faceting.sortFacetValuesBy.${a}`, 'one of `alpha`, `count`', how);
              out[a] = how;
            }
            f.sortFacetValuesBy = out;
          }
        }
        s.faceting = f;
        break;
      }
      case 'pagination': {
        if (v === null) { s.pagination = d.pagination; break; }
        const o = obj(k, v);
        only(k, o, ['maxTotalHits']);
        if ('maxTotalHits' in o) s.pagination = { maxTotalHits: o.maxTotalHits === null ? 1000 : int(k, 'pagination.maxTotalHits', o.maxTotalHits, 1) };
        break;
      }
    }
  }
  return { reindex };
}

/** Does an attribute pattern list (`*`, `a`, `a.*`, `a*`) cover this attribute? Nested paths are covered by their parent. */
export function attrMatches(patterns: string[], attr: string): boolean {
  for (const p of patterns) {
    if (p === '*' || p === attr) return true;
    if (attr.startsWith(p + '.')) return true;
    if (p.endsWith('*') && attr.startsWith(p.slice(0, -1))) return true;
  }
  return false;
}
