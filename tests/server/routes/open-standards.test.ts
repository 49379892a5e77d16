import { describe, it, expect, beforeAll } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { validateXML } from 'xmllint-wasm';
import { anonymous, createUser, testApp } from '../../support/http';
import { buildExcerpt, buildSource } from '../../support/factories';
import supertest from 'supertest';

const schema = (name: string) => readFileSync(resolve(import.meta.dirname, '../../fixtures/schemas', name), 'utf8');

async function relaxNgErrors(xml: string, schemaFile: string): Promise<string[]> {
  const result = await validateXML({ xml: [{ fileName: 'doc.xml', contents: xml }], schema: [schema(schemaFile)], extension: 'relaxng' });
  return result.errors.map((e) => e.rawMessage);
}

let manuscriptId: string;
let printedId: string;
let draftId: string;

beforeAll(async () => {
  const contributor = await createUser('contributor', { displayName: 'Clara Testwood' });
  const manuscript = await buildSource(contributor.id, { title: 'Inventory of the music room & chapel' });
  manuscriptId = manuscript.publicId;
  await buildExcerpt(manuscript);
  await buildExcerpt(manuscript, { locatorValue: '13r', normalised: null, diplomatic: 'deux fluttes douces', term: 'fluttes douces', sizeSlug: 'tenor' });
  const printed = await buildSource(contributor.id, { title: 'Principes de la flûte (fictional)', sourceType: 'treatise', languages: ['fr'], dateEdtf: '1707' });
  printedId = printed.publicId;
  await buildExcerpt(printed, { locatorType: 'page', locatorValue: '23' });
  draftId = (await buildSource(contributor.id, { status: 'draft' })).publicId;
  for (let i = 0; i < 3; i += 1) await buildSource(contributor.id, { title: `Letter ${i}`, sourceType: 'letter' });
});

describe('GET /api/sources/:id/tei', () => {
  it('exports a manuscript as TEI P5 with msDesc, pb locators and orig/reg readings, valid against our TEI subset', async () => {
    const res = await (await anonymous()).get(`/api/sources/${manuscriptId}/tei`).expect(200);
    expect(res.headers['content-type']).toMatch(/application\/tei\+xml/);
    const xml = res.text;
    // TEI P5 Guidelines ch. 10.4: msIdentifier holds repository and idno (the shelfmark).
    expect(xml).toContain('<repository>Velmark Family Archive (fictional)</repository>');
    expect(xml).toContain('<idno>VFA Inv. 12</idno>');
    // TEI P5 ch. 3.5.1: <choice> pairs the original reading with its regularisation.
    expect(xml).toMatch(/<choice>\s*<orig>Item zwo Handtflöten/);
    expect(xml).toContain('<pb n="12v" type="folio"/>');
    expect(xml).toContain('&amp; chapel');
    expect(await relaxNgErrors(xml, 'windway-tei-subset.rng')).toEqual([]);
  });

  it('exports a printed source with a biblStruct', async () => {
    const xml = (await (await anonymous()).get(`/api/sources/${printedId}/tei`).expect(200)).text;
    expect(xml).toContain('<biblStruct>');
    expect(xml).not.toContain('<msDesc>');
    expect(await relaxNgErrors(xml, 'windway-tei-subset.rng')).toEqual([]);
  });

  it('answers 404 for a draft and 400 for a malformed id', async () => {
    const client = await anonymous();
    expect((await client.get(`/api/sources/${draftId}/tei`)).status).toBe(404);
    expect((await client.get('/api/sources/nonsense/tei')).status).toBe(400);
  });
});

describe('GET /oai (OAI-PMH 2.0)', () => {
  const oai = async (query: string) => (await supertest(await testApp()).get(`/oai?${query}`).expect(200)).text;

  it('answers Identify (§4.2) with a valid response', async () => {
    const xml = await oai('verb=Identify');
    expect(xml).toContain('<protocolVersion>2.0</protocolVersion>');
    expect(await relaxNgErrors(xml, 'oai-pmh-subset.rng')).toEqual([]);
  });

  it('lists oai_dc as its metadata format (§4.4)', async () => {
    const xml = await oai('verb=ListMetadataFormats');
    expect(xml).toContain('<metadataPrefix>oai_dc</metadataPrefix>');
    expect(await relaxNgErrors(xml, 'oai-pmh-subset.rng')).toEqual([]);
  });

  it('lists sets by source type (§4.6)', async () => {
    const xml = await oai('verb=ListSets');
    expect(xml).toContain('<setSpec>type:letter</setSpec>');
    expect(await relaxNgErrors(xml, 'oai-pmh-subset.rng')).toEqual([]);
  });

  it('lists only approved records with Dublin Core (§4.5), selectable by set', async () => {
    const xml = await oai('verb=ListRecords&metadataPrefix=oai_dc');
    expect(xml).toContain(`oai:windway:${manuscriptId}`);
    expect(xml).not.toContain(draftId);
    expect(xml).toContain('<dc:title>Inventory of the music room &amp; chapel</dc:title>');
    expect(await relaxNgErrors(xml, 'oai-pmh-subset.rng')).toEqual([]);
    const letters = await oai('verb=ListIdentifiers&metadataPrefix=oai_dc&set=type:letter');
    expect(letters.match(/<header>/g)).toHaveLength(3);
  });

  it('selects by datestamp (§3.3) and reports noRecordsMatch for a range before any record', async () => {
    const today = new Date().toISOString().slice(0, 10);
    expect(await oai(`verb=ListIdentifiers&metadataPrefix=oai_dc&from=${today}`)).toContain('<header>');
    const none = await oai('verb=ListIdentifiers&metadataPrefix=oai_dc&until=1999-01-01');
    expect(none).toContain('code="noRecordsMatch"');
  });

  it('pages with resumption tokens (§3.5) until an empty token', async () => {
    const { Source } = await import('@server/models');
    const contributor = await createUser('contributor');
    for (let i = 0; i < 55; i += 1) await buildSource(contributor.id, { title: `Account leaf ${i}`, sourceType: 'account' });
    const first = await oai('verb=ListIdentifiers&metadataPrefix=oai_dc&set=type:account');
    const token = /<resumptionToken completeListSize="55" cursor="0">([^<]+)<\/resumptionToken>/.exec(first)?.[1];
    expect(token).toBeTruthy();
    const second = await oai(`verb=ListIdentifiers&resumptionToken=${token}`);
    expect(second.match(/<header>/g)).toHaveLength(5);
    expect(second).toMatch(/<resumptionToken completeListSize="55" cursor="50"\/>/);
    expect(await relaxNgErrors(second, 'oai-pmh-subset.rng')).toEqual([]);
    expect(await Source.count({ where: { sourceType: 'account' } })).toBe(55);
  });

  it('GetRecord returns one record (§4.1) and idDoesNotExist for an unknown one', async () => {
    expect(await oai(`verb=GetRecord&metadataPrefix=oai_dc&identifier=oai:windway:${printedId}`)).toContain('<dc:language>fr</dc:language>');
    expect(await oai('verb=GetRecord&metadataPrefix=oai_dc&identifier=oai:windway:S0000000')).toContain('code="idDoesNotExist"');
  });

  it.each([
    ['verb=Frobnicate', 'badVerb'],
    ['', 'badVerb'],
    ['verb=ListRecords', 'badArgument'],
    ['verb=Identify&extra=1', 'badArgument'],
    ['verb=ListRecords&metadataPrefix=marc21', 'cannotDisseminateFormat'],
    ['verb=ListRecords&resumptionToken=not-a-token', 'badResumptionToken'],
    ['verb=ListRecords&metadataPrefix=oai_dc&from=2020-13-45', 'badArgument'],
    ['verb=ListRecords&metadataPrefix=oai_dc&from=2020-01-01&until=2020-01-01T00:00:00Z', 'badArgument'],
  ])('answers %s with the error code %s (§3.6)', async (query, code) => {
    const xml = await oai(query);
    expect(xml).toContain(`code="${code}"`);
    expect(await relaxNgErrors(xml, 'oai-pmh-subset.rng')).toEqual([]);
  });
});
