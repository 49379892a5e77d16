import { create } from 'xmlbuilder2';
import type { XMLBuilder } from 'xmlbuilder2/lib/interfaces';
import { Op, type WhereOptions } from 'sequelize';
import { sourceTypes, sourceTypeLabels, printedSourceTypes, type SourceType } from '@shared/catalogue/vocabulary';
import { Source } from '../../models';

/**
 * OAI-PMH 2.0 (Open Archives Initiative Protocol for Metadata Harvesting, v2.0, 2002):
 * approved sources as `oai_dc` records, sets by source type, resumption tokens.
 */
export const OAI_PAGE_SIZE = 50;
const OAI_NS = 'http://www.openarchives.org/OAI/2.0/';
const XSI_NS = 'http://www.w3.org/2001/XMLSchema-instance';
const DC_NS = 'http://purl.org/dc/elements/1.1/';
const OAI_DC_NS = 'http://www.openarchives.org/OAI/2.0/oai_dc/';
const ID_PREFIX = 'oai:windway:';

type OaiErrorCode =
  | 'badArgument'
  | 'badResumptionToken'
  | 'badVerb'
  | 'cannotDisseminateFormat'
  | 'idDoesNotExist'
  | 'noRecordsMatch'
  | 'noMetadataFormats'
  | 'noSetHierarchy';

class OaiError extends Error {
  constructor(readonly code: OaiErrorCode, message: string) {
    super(message);
  }
}

// §3.1.1: the arguments each verb accepts (required ones are checked in the handlers).
const allowedArguments: Record<string, string[]> = {
  Identify: [],
  ListMetadataFormats: ['identifier'],
  ListSets: ['resumptionToken'],
  ListIdentifiers: ['metadataPrefix', 'from', 'until', 'set', 'resumptionToken'],
  ListRecords: ['metadataPrefix', 'from', 'until', 'set', 'resumptionToken'],
  GetRecord: ['identifier', 'metadataPrefix'],
};

export interface OaiContext {
  baseUrl: string;
  permalink: (publicId: string, version: number) => string;
  now?: Date;
}

/** Answers one OAI-PMH request; `args` are the query (or form) parameters, each possibly repeated. */
export async function handleOaiRequest(args: Record<string, string | string[] | undefined>, context: OaiContext): Promise<string> {
  const now = context.now ?? new Date();
  const doc = create({ version: '1.0', encoding: 'UTF-8' });
  const root = doc
    .ele(OAI_NS, 'OAI-PMH')
    .att(XSI_NS, 'xsi:schemaLocation', `${OAI_NS} http://www.openarchives.org/OAI/2.0/OAI-PMH.xsd`);
  root.ele('responseDate').txt(isoSeconds(now));
  const request = root.ele('request').txt(context.baseUrl);
  try {
    const params = singleValued(args);
    const verb = params.verb;
    if (!verb || !(verb in allowedArguments)) throw new OaiError('badVerb', verb ? `"${verb}" is not an OAI-PMH verb.` : 'The verb argument is missing.');
    for (const name of Object.keys(params)) {
      if (name !== 'verb' && !allowedArguments[verb].includes(name)) throw new OaiError('badArgument', `${verb} does not take the argument "${name}".`);
    }
    if (params.resumptionToken && Object.keys(params).length > 2) {
      throw new OaiError('badArgument', 'resumptionToken is an exclusive argument.');
    }
    // §3.2: the request element echoes the arguments only when they were valid.
    for (const [name, value] of Object.entries(params)) request.att(name, value);
    const body = root.ele(verb);
    try {
      await verbs[verb as keyof typeof verbs](body, params, context);
    } catch (error) {
      // §3.6: an error response carries the error instead of the verb's element.
      body.remove();
      throw error;
    }
  } catch (error) {
    if (!(error instanceof OaiError)) throw error;
    root.ele('error').att('code', error.code).txt(error.message);
  }
  return doc.end({ prettyPrint: true });
}

function singleValued(args: Record<string, string | string[] | undefined>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [name, value] of Object.entries(args)) {
    if (value === undefined) continue;
    if (Array.isArray(value)) throw new OaiError('badArgument', `The argument "${name}" is repeated.`);
    out[name] = value;
  }
  return out;
}

const verbs = {
  async Identify(body: XMLBuilder, _p: Record<string, string>, context: OaiContext) {
    const earliest = await Source.min<Date, Source>('updatedAt', { where: { status: 'approved' } });
    body.ele('repositoryName').txt('Windway — primary sources on historical woodwinds');
    body.ele('baseURL').txt(context.baseUrl);
    body.ele('protocolVersion').txt('2.0');
    body.ele('adminEmail').txt('archive@windway.invalid');
    body.ele('earliestDatestamp').txt(isoSeconds(earliest ? new Date(earliest) : new Date(0)));
    body.ele('deletedRecord').txt('no');
    body.ele('granularity').txt('YYYY-MM-DDThh:mm:ssZ');
  },

  async ListMetadataFormats(body: XMLBuilder, params: Record<string, string>) {
    if (params.identifier) await findRecord(params.identifier);
    const format = body.ele('metadataFormat');
    format.ele('metadataPrefix').txt('oai_dc');
    format.ele('schema').txt('http://www.openarchives.org/OAI/2.0/oai_dc.xsd');
    format.ele('metadataNamespace').txt(OAI_DC_NS);
  },

  async ListSets(body: XMLBuilder, params: Record<string, string>) {
    if (params.resumptionToken) throw new OaiError('badResumptionToken', 'ListSets is answered in one response; this token is not valid.');
    for (const type of sourceTypes) {
      const set = body.ele('set');
      set.ele('setSpec').txt(`type:${type}`);
      set.ele('setName').txt(sourceTypeLabels[type]);
    }
  },

  ListIdentifiers: (body: XMLBuilder, params: Record<string, string>, context: OaiContext) => list(body, params, context, false),
  ListRecords: (body: XMLBuilder, params: Record<string, string>, context: OaiContext) => list(body, params, context, true),

  async GetRecord(body: XMLBuilder, params: Record<string, string>, context: OaiContext) {
    if (!params.identifier || !params.metadataPrefix) throw new OaiError('badArgument', 'GetRecord needs identifier and metadataPrefix.');
    checkPrefix(params.metadataPrefix);
    record(body.ele('record'), await findRecord(params.identifier), context, true);
  },
};

interface ListState {
  metadataPrefix: string;
  from?: string;
  until?: string;
  set?: string;
  offset: number;
}

async function list(body: XMLBuilder, params: Record<string, string>, context: OaiContext, withMetadata: boolean) {
  const state = params.resumptionToken ? decodeToken(params.resumptionToken) : newListState(params);
  checkPrefix(state.metadataPrefix);
  const where: WhereOptions<Source> = { status: 'approved' };
  const updated: Record<symbol, Date> = {};
  if (state.from) updated[Op.gte] = parseDatestamp(state.from, 'from', false);
  if (state.until) updated[Op.lte] = parseDatestamp(state.until, 'until', true);
  if (state.from || state.until) Object.assign(where, { updatedAt: updated });
  if (state.set) {
    const type = state.set.replace(/^type:/, '');
    if (!state.set.startsWith('type:') || !sourceTypes.includes(type as SourceType)) throw new OaiError('noRecordsMatch', `There is no set "${state.set}".`);
    Object.assign(where, { sourceType: type });
  }
  const { rows, count } = await Source.findAndCountAll({ where, order: [['updatedAt', 'ASC'], ['id', 'ASC']], offset: state.offset, limit: OAI_PAGE_SIZE });
  if (count === 0) throw new OaiError('noRecordsMatch', 'No records match these arguments.');
  if (state.offset >= count) throw new OaiError('badResumptionToken', 'This resumption token is past the end of the list.');
  for (const source of rows) {
    if (withMetadata) record(body.ele('record'), source, context, true);
    else recordHeader(body.ele('header'), source);
  }
  // §3.5: a token for the next page; an empty token on the last page of a multi-page list.
  const next = state.offset + rows.length;
  if (state.offset > 0 || next < count) {
    const token = body.ele('resumptionToken').att('completeListSize', String(count)).att('cursor', String(state.offset));
    if (next < count) token.txt(encodeToken({ ...state, offset: next }));
  }
}

function newListState(params: Record<string, string>): ListState {
  if (!params.metadataPrefix) throw new OaiError('badArgument', 'metadataPrefix is required.');
  if (params.from && params.until && params.from.length !== params.until.length) {
    throw new OaiError('badArgument', 'from and until must have the same granularity.');
  }
  const state: ListState = { metadataPrefix: params.metadataPrefix, from: params.from, until: params.until, set: params.set, offset: 0 };
  if (state.from) parseDatestamp(state.from, 'from', false);
  if (state.until) parseDatestamp(state.until, 'until', true);
  if (state.from && state.until && parseDatestamp(state.from, 'from', false) > parseDatestamp(state.until, 'until', true)) {
    throw new OaiError('badArgument', 'from is later than until.');
  }
  return state;
}

function checkPrefix(prefix: string) {
  if (prefix !== 'oai_dc') throw new OaiError('cannotDisseminateFormat', `The format "${prefix}" is not offered; use oai_dc.`);
}

function parseDatestamp(value: string, name: string, endOfDay: boolean): Date {
  const match = /^(\d{4}-\d{2}-\d{2})(T\d{2}:\d{2}:\d{2}Z)?$/.exec(value);
  const date = match ? new Date(match[2] ? value : `${match[1]}T${endOfDay ? '23:59:59.999' : '00:00:00.000'}Z`) : new Date(NaN);
  if (Number.isNaN(date.getTime())) throw new OaiError('badArgument', `${name} must be YYYY-MM-DD or YYYY-MM-DDThh:mm:ssZ.`);
  return date;
}

const encodeToken = (state: ListState) => Buffer.from(JSON.stringify(state)).toString('base64url');
function decodeToken(token: string): ListState {
  try {
    const state = JSON.parse(Buffer.from(token, 'base64url').toString('utf8')) as ListState;
    if (typeof state.metadataPrefix !== 'string' || !Number.isInteger(state.offset) || state.offset < 0) throw new Error('shape');
    return state;
  } catch {
    throw new OaiError('badResumptionToken', 'This resumption token is not valid.');
  }
}

async function findRecord(identifier: string): Promise<Source> {
  const publicId = identifier.startsWith(ID_PREFIX) ? identifier.slice(ID_PREFIX.length) : '';
  const source = publicId ? await Source.findOne({ where: { publicId, status: 'approved' } }) : null;
  if (!source) throw new OaiError('idDoesNotExist', `"${identifier}" is not an identifier in this repository.`);
  return source;
}

function recordHeader(header: XMLBuilder, source: Source) {
  header.ele('identifier').txt(`${ID_PREFIX}${source.publicId}`);
  header.ele('datestamp').txt(isoSeconds(source.updatedAt));
  header.ele('setSpec').txt(`type:${source.sourceType}`);
}

/** Simple Dublin Core (DCMES 1.1) of a source. */
function record(element: XMLBuilder, source: Source, context: OaiContext, withMetadata: boolean) {
  recordHeader(element.ele('header'), source);
  if (!withMetadata) return;
  const dc = element
    .ele('metadata')
    .ele(OAI_DC_NS, 'oai_dc:dc')
    .att('xmlns:dc', DC_NS)
    .att(XSI_NS, 'xsi:schemaLocation', `${OAI_DC_NS} http://www.openarchives.org/OAI/2.0/oai_dc.xsd`);
  const add = (name: string, value: string | null | undefined) => {
    if (value) dc.ele(DC_NS, `dc:${name}`).txt(value);
  };
  add('title', source.title);
  for (const creator of source.creators) add(creator.role === 'author' || creator.role === 'compiler' ? 'creator' : 'contributor', creator.name);
  add('type', printedSourceTypes.includes(source.sourceType) ? 'Text' : 'Text');
  add('type', sourceTypeLabels[source.sourceType]);
  add('date', source.dateEdtf);
  for (const language of source.languages) add('language', language);
  add('coverage', source.place);
  add('publisher', source.publication?.publisher);
  add('source', [source.holdingInstitution, source.shelfmark].filter(Boolean).join(', ') || null);
  add('rights', source.rightsStatement);
  add('identifier', context.permalink(source.publicId, source.approvedVersion ?? source.version));
}

const isoSeconds = (date: Date) => `${date.toISOString().slice(0, 19)}Z`;
