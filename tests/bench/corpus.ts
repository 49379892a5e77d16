/**
 * A fictional archive for the benchmark, made from a fixed seed: sources in six
 * languages, excerpts of 40–250 words over Zipf-distributed vocabularies (real
 * period-flavoured words at the head, invented words of each language's sound in
 * the tail), instrument mentions, pitch tags and dates with plausible spreads.
 * The PRNG is mulberry32 (Math.imul, 32-bit), never a float LCG: see
 * shared/handbook/search-engines.md on the corpus that repeated after 10,000 values.
 */
import { createHash } from 'node:crypto';
import { describeEdtf } from '@shared/reckoner/dates';
import type { SourceType } from '@shared/catalogue/vocabulary';

export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const LANGS = ['en', 'fr', 'de', 'it', 'nl', 'la'] as const;
export type Lang = (typeof LANGS)[number];

const HEAD: Record<Lang, string> = {
  en: 'the of and to a in flute recorder consort musick play tone hole finger wind breath sound sweet treble tenor bass pitch tune instrument master scholar concert chamber church lesson air sonata voluntary compass note sharp flat key chest pipe maker ivory boxwood ebony joint bore reed choir gentleman lady quire hautboy ayre division ground',
  fr: 'la le de et les des flûte bec traversière musique son ton trou doigt vent haleine douce dessus taille basse ton chapelle concert roi chambre airs sonate cadence tremblement port voix accord clef dièse bémol instrument maître facteur buis ivoire ébène corps perce anche hautbois musette plaisir',
  de: 'die der und das in zu von mit flöte blockflöte querflöte musik ton loch finger wind atem klang süß diskant tenor bass stimmung chorton kammerton kapelle hof kirche konzert sonate triller griff kreuz schlüssel instrument meister macher buchsbaum elfenbein röhre rohr oboe zink posaune chor',
  it: 'il la di e che per flauto dolce traverso musica suono tono buco dito vento fiato soave soprano tenore basso corista cappella chiesa camera concerto sonata trillo tasto diesis bemolle strumento maestro artefice bosso avorio ebano canna ancia oboe cornetto coro',
  nl: 'de het en van een in fluit blokfluit dwarsfluit muziek toon gat vinger wind adem klank zoet discant tenor bas stemming kapel kerk kamer concert sonate triller greep kruis sleutel instrument meester maker palmhout ivoor ebben buis riet hobo schalmei koor',
  la: 'et in de ad cum est fistula tibia musica sonus tonus foramen digitus ventus spiritus dulcis cantus tenor bassus chorus capella ecclesia camera concentus modus clavis instrumentum magister artifex buxus ebur calamus lingua cornu organum vox',
};
const SYLLABLES: Record<Lang, string[]> = {
  en: ['th', 'ow', 'ing', 'ber', 'sh', 'ey', 'wor', 'ck', 'ly', 'stan', 'mer', 'ght'],
  fr: ['eau', 'oi', 'ion', 'ment', 'ais', 'ou', 'ch', 'gn', 'eur', 'ier', 'que', 'ance'],
  de: ['sch', 'ei', 'ung', 'ach', 'ter', 'keit', 'ig', 'pf', 'au', 'lich', 'st', 'en'],
  it: ['zio', 'ella', 'gli', 'etto', 'ano', 'cci', 'ore', 'ia', 'mente', 'ssa', 'to', 'ra'],
  nl: ['ij', 'oe', 'sch', 'aa', 'heid', 'ig', 'ui', 'lijk', 'en', 'ge', 'cht', 'ee'],
  la: ['us', 'um', 'orum', 'ae', 'tio', 'ibus', 'que', 'ter', 'ar', 'ex', 'is', 'ant'],
};
const TAIL_WORDS = 12_000;

export interface SizeTerm { slug: string; term: Record<Lang, string>; weight: number }
export const SIZE_TERMS: SizeTerm[] = [
  { slug: 'alto', weight: 30, term: { en: 'treble', fr: 'flûte douce', de: 'Altflöte', it: 'flauto', nl: 'altfluit', la: 'fistula media' } },
  { slug: 'soprano', weight: 14, term: { en: 'fifth flute', fr: 'petite flûte', de: 'Discantflöte', it: 'flautino', nl: 'discantfluit', la: 'fistula acuta' } },
  { slug: 'tenor', weight: 14, term: { en: 'tenor', fr: 'taille de flûte', de: 'Tenorflöte', it: 'flauto tenore', nl: 'tenorfluit', la: 'tibia tenor' } },
  { slug: 'bass', weight: 10, term: { en: 'bass flute', fr: 'basse de flûte', de: 'Bassflöte', it: 'flauto basso', nl: 'basfluit', la: 'tibia bassa' } },
  { slug: 'voice-flute', weight: 7, term: { en: 'voice flute', fr: 'flûte de voix', de: 'Stimmflöte', it: 'flauto di voce', nl: 'stemfluit', la: 'fistula vocis' } },
  { slug: 'sopranino', weight: 4, term: { en: 'octave flute', fr: 'petit dessus', de: 'Klein Flöttlein', it: 'ottavino', nl: 'octaaffluit', la: 'fistula minima' } },
  { slug: 'great-bass', weight: 4, term: { en: 'great bass', fr: 'grosse basse', de: 'Großbass', it: 'basso grande', nl: 'grootbas', la: 'bassus magnus' } },
  { slug: 'contrabass', weight: 2, term: { en: 'double bass flute', fr: 'contrebasse', de: 'Subbass', it: 'contrabbasso', nl: 'contrabas', la: 'bassus profundus' } },
  { slug: 'flute-one-keyed', weight: 15, term: { en: 'German flute', fr: 'flûte traversière', de: 'Traversflöte', it: 'traversa', nl: 'dwarsfluit', la: 'tibia transversa' } },
];
const SOURCE_TYPES: [SourceType, number][] = [
  ['treatise', 18], ['tutor', 14], ['account', 14], ['inventory', 12], ['letter', 10], ['court-record', 9], ['music-preface', 9], ['diary', 5], ['makers-list', 4], ['newspaper', 3], ['other', 2],
];
const LANG_WEIGHTS: [Lang, number][] = [['en', 30], ['fr', 20], ['de', 20], ['it', 12], ['nl', 8], ['la', 10]];
const PLACES = ['Oderstadt', 'Fenwick Parva', 'Velmark', 'Brannholm', 'Castel Rovena', 'Lindenau', 'Ste-Aulaire-sur-Lys', 'Hoogewerf', 'Marrowby', 'Quellental', 'Torrebianca', 'Saint-Évrard', 'Ashcombe Regis', 'Wendelsee', 'Grevenmoor']; // fictional towns
const PITCHES = [[392, 20], [403, 8], [415, 30], [430, 8], [440, 14], [466, 15], [480, 5]] as const;

export interface SourceRow {
  id: number; publicId: string; title: string; sourceType: SourceType; creators: string; dateEdtf: string; dateEarliest: string;
  dateLatest: string; dateLabel: string; place: string; languages: string; status: 'approved' | 'draft'; lang: Lang;
}
export interface ExcerptRow {
  id: number; publicId: string; sourceId: number; locatorValue: string; diplomatic: string; normalised: string | null; translation: string | null;
  commentary: string | null; dateEdtf: string | null; dateEarliest: string | null; dateLatest: string | null; dateLabel: string | null; status: 'approved' | 'draft';
}
export interface MentionRow { excerptId: number; term: string; language: string; sizeSlug: string; position: number }
export interface PitchRow { excerptId: number; aHz: number; cents: number; position: number }

export class Corpus {
  readonly rand: () => number;
  private readonly vocab = new Map<Lang, { words: string[]; cum: Float64Array }>();
  /** Words of mid frequency per language (ranks 30–1500) and two-word phrases seen in texts, for queries. */
  readonly queryWords = new Map<Lang, string[]>();
  readonly phrases: string[] = [];
  readonly textHashes = new Set<string>();

  constructor(seed: number) {
    this.rand = mulberry32(seed);
    for (const lang of LANGS) {
      const head = [...new Set(HEAD[lang].split(' '))];
      const syl = SYLLABLES[lang];
      const tail = new Set<string>();
      for (let i = 0; tail.size < TAIL_WORDS; i++) {
        let w = '';
        for (let x = i + syl.length * 3; x > 0; x = Math.floor(x / syl.length)) w += syl[x % syl.length];
        if (!head.includes(w)) tail.add(w);
      }
      const words = [...head, ...tail];
      const cum = new Float64Array(words.length);
      let s = 0;
      for (let k = 0; k < words.length; k++) cum[k] = s += 1 / (k + 1);
      this.vocab.set(lang, { words, cum });
      this.queryWords.set(lang, words.slice(30, 1500).filter((w) => w.length >= 4));
    }
  }

  int(lo: number, hi: number): number { return lo + Math.floor(this.rand() * (hi - lo + 1)); }
  pick<T>(list: readonly T[]): T { return list[Math.floor(this.rand() * list.length)]; }
  weighted<T>(list: readonly (readonly [T, number])[]): T {
    let u = this.rand() * list.reduce((a, [, w]) => a + w, 0);
    for (const [v, w] of list) if ((u -= w) < 0) return v;
    return list[list.length - 1][0];
  }

  word(lang: Lang): string {
    const { words, cum } = this.vocab.get(lang)!;
    const u = this.rand() * cum[cum.length - 1];
    let lo = 0, hi = words.length - 1;
    while (lo < hi) { const m = (lo + hi) >> 1; if (cum[m] < u) lo = m + 1; else hi = m; }
    return words[lo];
  }

  text(lang: Lang, n: number, insert: string[] = []): string {
    const out: string[] = [];
    for (let i = 0; i < n; i++) {
      out.push(this.word(lang));
      if (insert.length && this.rand() < insert.length / n) out.push(insert[this.int(0, insert.length - 1)]);
      if (this.rand() < 0.08) out[out.length - 1] += this.pick([',', ';', ':', '.']);
    }
    const s = out.join(' ');
    return s.charAt(0).toUpperCase() + s.slice(1) + '.';
  }

  /** Old spelling: long s inside words, as a diplomatic transcription keeps it. */
  oldSpelling(text: string): string {
    return text.replace(/s(?=[a-z])/g, () => (this.rand() < 0.5 ? 'ſ' : 's'));
  }

  year(): number {
    return Math.round(1500 + 300 * ((this.rand() + this.rand() + this.rand()) / 3));
  }

  edtf(): string {
    const y = this.year();
    const r = this.rand();
    return r < 0.7 ? String(y) : r < 0.85 ? `${y}~` : `${y}/${Math.min(1800, y + this.int(2, 30))}`;
  }

  source(id: number, contributorId: number): SourceRow & { contributorId: number } {
    const lang = this.weighted(LANG_WEIGHTS);
    const langs = this.rand() < 0.1 ? [lang, this.pick(LANGS.filter((l) => l !== lang))] : [lang];
    const date = describeEdtf(this.edtf());
    return {
      id, publicId: `S${id.toString(36).toUpperCase().padStart(7, '0')}`, contributorId,
      title: this.text(lang, this.int(3, 9)).replace(/\.$/, ''), sourceType: this.weighted(SOURCE_TYPES),
      creators: JSON.stringify([{ name: `${this.text('en', 1).replace(/\.$/, '')} ${this.text(lang, 1).replace(/\.$/, '')}`, role: 'author' }]),
      dateEdtf: date.edtf, dateEarliest: date.earliest, dateLatest: date.latest, dateLabel: date.label,
      place: this.pick(PLACES), languages: JSON.stringify(langs), status: this.rand() < 0.95 ? 'approved' : 'draft', lang,
    };
  }

  excerpt(id: number, source: SourceRow): { excerpt: ExcerptRow; mentions: MentionRow[]; pitch: PitchRow[] } {
    const lang = source.lang;
    const sizes = [...new Set(Array.from({ length: this.weighted([[1, 55], [2, 30], [3, 15]] as const) }, () => this.weighted(SIZE_TERMS.map((s) => [s, s.weight] as const))))];
    const terms = sizes.map((s) => s.term[lang]);
    const n = this.int(40, 250);
    const plain = this.text(lang, n, terms);
    const hash = createHash('sha1').update(plain).digest('base64');
    this.textHashes.add(hash);
    if (this.phrases.length < 2000 && this.rand() < 0.05) {
      const ws = plain.toLowerCase().split(/[^\p{L}]+/u).filter((w) => w.length > 3);
      const at = this.int(0, Math.max(0, ws.length - 2));
      if (ws[at + 1]) this.phrases.push(`${ws[at]} ${ws[at + 1]}`);
    }
    const ownDate = this.rand() < 0.2 ? describeEdtf(String(Math.min(1800, Number(source.dateEarliest.slice(0, 4)) + this.int(0, 5)))) : null;
    const excerpt: ExcerptRow = {
      id, publicId: `E${id.toString(36).toUpperCase().padStart(7, '0')}`, sourceId: source.id, locatorValue: `${this.int(1, 300)}${this.pick(['r', 'v'])}`,
      diplomatic: lang === 'en' || lang === 'de' ? this.oldSpelling(plain) : plain,
      normalised: this.rand() < 0.5 ? plain : null,
      translation: lang !== 'en' && this.rand() < 0.6 ? this.text('en', Math.round(n * 1.1), sizes.map((s) => s.term.en)) : null,
      commentary: this.rand() < 0.3 ? this.text('en', this.int(20, 80)) : null,
      dateEdtf: ownDate?.edtf ?? null, dateEarliest: ownDate?.earliest ?? null, dateLatest: ownDate?.latest ?? null, dateLabel: ownDate?.label ?? null,
      status: this.rand() < 0.9 ? 'approved' : 'draft',
    };
    const mentions = sizes.map((s, position) => ({ excerptId: id, term: s.term[lang], language: lang, sizeSlug: s.slug, position }));
    const pitchCount = this.weighted([[0, 40], [1, 50], [2, 10]] as const);
    const pitch = Array.from({ length: pitchCount }, (_, position) => {
      const aHz = Math.round((this.weighted(PITCHES) + (this.rand() - 0.5) * 4) * 100) / 100;
      return { excerptId: id, aHz, cents: Math.round(12000 * Math.log2(aHz / 440)) / 10, position };
    });
    return { excerpt, mentions, pitch };
  }
}
