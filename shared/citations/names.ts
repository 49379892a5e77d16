import type { CreatorRole } from '../catalogue/vocabulary';

/** A CSL name (CSL 1.0.2, "Name-variables"): a person's parts, or a `literal` for an institution. */
export interface CslName {
  family?: string;
  given?: string;
  'non-dropping-particle'?: string;
  literal?: string;
}

/** Lower-case particles kept with the family name ("Jacob van Eyck", "Michel de La Barre"). */
const PARTICLES = new Set(['de', 'du', 'des', "d'", 'da', 'di', 'del', 'della', 'van', 'von', 'der', 'den', 'ten', 'ter', 'le', 'la', 'zu', 'vom', 'y']);

/**
 * Words that mark a corporate creator (a court, a chapel, a guild…). Such names are
 * written as CSL `literal` so styles never invert them ("Hofkapelle, Oderstadt").
 */
const INSTITUTION =
  /\b(court|chapel|chapter|cathedral|church|abbey|society|company|library|archives?|kapelle|hofkapelle|collegium|academy|acad[eé]mie|accademia|council|office|guild|town|city|consistory|chamber|kammer|orchestra|musicians|waits|corporation|parish|college|university|ministry|board|confr[eé]rie|hof)\b/i;

export function isInstitution(name: string): boolean {
  const trimmed = name.trim();
  return INSTITUTION.test(trimmed) || /[&\d]/.test(trimmed) || /^\[.*\]$/.test(trimmed) || trimmed.split(/\s+/).length > 4;
}

/**
 * "Family, Given" or "Given Family" (with particles: "Michel de La Barre" → given Michel,
 * particle de, family La Barre); institutions become `{ literal }`; one word is a family name.
 */
export function parseName(raw: string): CslName {
  const name = raw.trim().replace(/\s+/g, ' ');
  if (!name) return { literal: '' };
  if (isInstitution(name)) return { literal: name.replace(/^\[(.*)\]$/, '$1') };
  const comma = name.indexOf(',');
  if (comma > 0) {
    const familyPart = name.slice(0, comma).trim();
    const given = name.slice(comma + 1).trim();
    const words = familyPart.split(' ');
    const particles: string[] = [];
    while (words.length > 1 && PARTICLES.has(words[0])) particles.push(words.shift()!);
    // "Eyck, Jacob van": a trailing particle after the given name moves back to the family.
    const givenWords = given.split(' ');
    while (givenWords.length > 1 && PARTICLES.has(givenWords[givenWords.length - 1])) particles.unshift(givenWords.pop()!);
    return withParticle({ family: words.join(' '), given: givenWords.join(' ') || undefined }, particles);
  }
  const words = name.split(' ');
  if (words.length === 1) return { family: name };
  const particleAt = words.findIndex((w, i) => i > 0 && i < words.length - 1 && PARTICLES.has(w));
  if (particleAt > 0) {
    const given = words.slice(0, particleAt);
    const rest = words.slice(particleAt);
    const particles: string[] = [];
    while (rest.length > 1 && PARTICLES.has(rest[0])) particles.push(rest.shift()!);
    return withParticle({ given: given.join(' '), family: rest.join(' ') }, particles);
  }
  return { given: words.slice(0, -1).join(' '), family: words[words.length - 1] };
}

function withParticle(name: CslName, particles: string[]): CslName {
  const clean: CslName = {};
  if (name.family) clean.family = name.family;
  if (name.given) clean.given = name.given;
  if (particles.length) clean['non-dropping-particle'] = particles.join(' ');
  return clean;
}

/** "Family, Given" as a catalogue creator name, from a CSL name (used by the import). */
export function nameToCreator(name: CslName): string {
  if (name.literal) return name.literal;
  const family = [name['non-dropping-particle'], name.family].filter(Boolean).join(' ');
  return name.given ? `${family}, ${name.given}` : family;
}

export type CslNameRole = 'author' | 'editor' | 'translator' | 'compiler' | 'contributor';

/**
 * Catalogue roles → CSL name variables: authors and makers are `author`; a compiler is
 * the `author` when nobody else is (Chicago 17's CSL styles predate `compiler`, so it would
 * otherwise vanish); scribes are `contributor` (kept in the data, not printed by most styles).
 */
export function creatorsToCsl(creators: { name: string; role: CreatorRole }[]): Partial<Record<CslNameRole, CslName[]>> {
  const out: Partial<Record<CslNameRole, CslName[]>> = {};
  const hasAuthor = creators.some((c) => c.role === 'author' || c.role === 'maker');
  for (const creator of creators) {
    const role: CslNameRole =
      creator.role === 'author' || creator.role === 'maker'
        ? 'author'
        : creator.role === 'compiler'
          ? hasAuthor ? 'compiler' : 'author'
          : creator.role === 'scribe'
            ? 'contributor'
            : creator.role;
    (out[role] ??= []).push(parseName(creator.name));
  }
  return out;
}
