import { create } from 'xmlbuilder2';
import type { XMLBuilder } from 'xmlbuilder2/lib/interfaces';
import { printedSourceTypes, sourceTypeLabels } from '@shared/catalogue/vocabulary';
import { formatLocator } from '@shared/catalogue/locator';
import type { Excerpt, Source, User } from '../../models';

const TEI_NS = 'http://www.tei-c.org/ns/1.0';
const XML_NS = 'http://www.w3.org/XML/1998/namespace';

export interface TeiInput {
  source: Source & { contributor?: User };
  excerpts: (Excerpt & { contributor?: User })[];
  sizeNames: Record<string, string>;
  permalink: (kind: 'sources' | 'excerpts', publicId: string, version: number) => string;
}

/**
 * TEI P5 of an approved source with its excerpts (TEI P5 Guidelines: ch. 2 "The TEI
 * Header", ch. 10 "Manuscript Description", ch. 3.5 "Simple Editorial Changes").
 * A manuscript's holding is an msDesc; a printed source is a biblStruct.
 */
export function buildTei({ source, excerpts, sizeNames, permalink }: TeiInput): string {
  const doc = create({ version: '1.0', encoding: 'UTF-8' });
  const tei = doc.ele(TEI_NS, 'TEI').att(XML_NS, 'xml:lang', 'en').att(XML_NS, 'xml:id', `windway-${source.publicId}`);
  header(tei.ele('teiHeader'), source, permalink);
  const body = tei.ele('text').ele('body');
  if (excerpts.length === 0) body.ele('p').txt('No excerpts have been transcribed from this source yet.');
  for (const excerpt of excerpts) excerptDiv(body, excerpt, sizeNames, permalink);
  return doc.end({ prettyPrint: true });
}

function header(teiHeader: XMLBuilder, source: TeiInput['source'], permalink: TeiInput['permalink']) {
  const fileDesc = teiHeader.ele('fileDesc');
  const titleStmt = fileDesc.ele('titleStmt');
  titleStmt.ele('title').txt(source.title);
  for (const creator of source.creators) titleStmt.ele(creator.role === 'author' ? 'author' : 'editor').att('role', creator.role).txt(creator.name);
  if (source.contributor) {
    const resp = titleStmt.ele('respStmt');
    resp.ele('resp').txt('Catalogued and transcribed for Windway by');
    resp.ele('name').txt(source.contributor.displayName);
  }
  const publication = fileDesc.ele('publicationStmt');
  publication.ele('publisher').txt('Windway');
  publication.ele('idno').att('type', 'URI').txt(permalink('sources', source.publicId, source.approvedVersion ?? source.version));
  publication.ele('availability').ele('p').txt(source.rightsStatement ?? 'Rights not stated.');
  publication.ele('date').att('when', source.updatedAt.toISOString().slice(0, 10)).txt(source.updatedAt.toISOString().slice(0, 10));

  const sourceDesc = fileDesc.ele('sourceDesc');
  if (printedSourceTypes.includes(source.sourceType)) {
    const monogr = sourceDesc.ele('biblStruct').ele('monogr');
    for (const creator of source.creators) monogr.ele(creator.role === 'author' ? 'author' : 'editor').txt(creator.name);
    monogr.ele('title').txt(source.title);
    if (source.publication?.edition) monogr.ele('edition').txt(source.publication.edition);
    const imprint = monogr.ele('imprint');
    if (source.publication?.place ?? source.place) imprint.ele('pubPlace').txt((source.publication?.place ?? source.place)!);
    if (source.publication?.publisher) imprint.ele('publisher').txt(source.publication.publisher);
    dateElement(imprint, source);
  } else {
    const msDesc = sourceDesc.ele('msDesc');
    const identifier = msDesc.ele('msIdentifier');
    if (source.place) identifier.ele('settlement').txt(source.place);
    identifier.ele('repository').txt(source.holdingInstitution ?? 'Unknown repository');
    identifier.ele('idno').txt(source.shelfmark ?? 'no shelfmark');
    msDesc.ele('msContents').ele('summary').txt(`${sourceTypeLabels[source.sourceType]}: ${source.title}`);
    const origin = msDesc.ele('history').ele('origin');
    dateElement(origin, source, 'origDate');
    if (source.place) origin.ele('origPlace').txt(source.place);
  }
  const profile = teiHeader.ele('profileDesc');
  const langUsage = profile.ele('langUsage');
  for (const language of source.languages) langUsage.ele('language').att('ident', language).txt(language);
  profile.ele('textClass').ele('keywords').ele('term').att('type', 'sourceType').txt(sourceTypeLabels[source.sourceType]);
}

/** A date with its computed bounds, keeping the EDTF as written (TEI att.datable.custom: `datingMethod`). */
function dateElement(parent: XMLBuilder, source: Source, name: 'date' | 'origDate' = 'date') {
  const date = parent.ele(name);
  if (source.dateEarliest === source.dateLatest) date.att('when', source.dateEarliest);
  else date.att('notBefore', source.dateEarliest).att('notAfter', source.dateLatest);
  date.att('datingMethod', '#edtf').att('when-custom', source.dateEdtf).txt(source.dateLabel);
}

function excerptDiv(body: XMLBuilder, excerpt: TeiInput['excerpts'][number], sizeNames: Record<string, string>, permalink: TeiInput['permalink']) {
  const div = body
    .ele('div')
    .att('type', 'excerpt')
    .att(XML_NS, 'xml:id', excerpt.publicId)
    .att('n', formatLocator(excerpt.locatorType, excerpt.locatorValue))
    .att('source', permalink('excerpts', excerpt.publicId, excerpt.approvedVersion ?? excerpt.version));
  const first = excerpt.locatorValue.split(/\s*[-–]\s*/)[0];
  div.ele(excerpt.locatorType === 'column' ? 'cb' : 'pb').att('n', first).att('type', excerpt.locatorType);
  const reading = div.ele('ab').att('type', 'transcription');
  const normalised = excerpt.normalised?.trim();
  if (normalised && normalised !== excerpt.diplomatic.trim()) {
    const choice = reading.ele('choice');
    choice.ele('orig').txt(excerpt.diplomatic);
    choice.ele('reg').txt(normalised);
  } else {
    reading.txt(excerpt.diplomatic);
  }
  if (excerpt.translation) {
    const translation = div.ele('div').att('type', 'translation');
    if (excerpt.translationLanguage) translation.att(XML_NS, 'xml:lang', excerpt.translationLanguage);
    if (excerpt.translator) translation.att('resp', `#${slug(excerpt.translator)}`);
    translation.ele('ab').txt(excerpt.translation);
  }
  if (excerpt.commentary) div.ele('note').att('type', 'commentary').txt(excerpt.commentary);
  const mentions = excerpt.mentions ?? [];
  if (mentions.length > 0) {
    const list = div.ele('note').att('type', 'instruments').ele('list');
    for (const mention of mentions) {
      const item = list.ele('item');
      item.ele('term').att(XML_NS, 'xml:lang', mention.language).att('cert', certaintyLevel(mention.certainty)).txt(mention.term);
      item.ele('gloss').txt(sizeNames[mention.sizeSlug] ?? mention.sizeSlug);
    }
  }
  for (const tag of excerpt.pitchTags ?? []) {
    div.ele('note').att('type', 'pitch').ele('measure').att('type', 'aPrime').att('unit', 'Hz').att('quantity', String(Number(tag.aHz))).txt(tag.statement);
  }
  if (excerpt.dateEdtf && excerpt.dateEarliest && excerpt.dateLatest) {
    div.ele('note').att('type', 'date').ele('date').att('notBefore', excerpt.dateEarliest).att('notAfter', excerpt.dateLatest).txt(excerpt.dateLabel ?? excerpt.dateEdtf);
  }
}

const certaintyLevel = (certainty: string) => ({ certain: 'high', probable: 'medium', conjectural: 'low' })[certainty] ?? 'unknown';
const slug = (text: string) => text.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'translator';
