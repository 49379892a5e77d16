/**
 * Document payload checks: shape at enqueue time (400), primary key
 * selection and document ids at processing time (a failed task, nothing
 * changed), with Meilisearch's codes and messages.
 */
import { ApiError } from './errors';
import type { Doc, SearchIndex } from './index-store';

export function documentsPayload(body: unknown): Doc[] {
  const list = Array.isArray(body) ? body : [body];
  for (const d of list) {
    if (!d || typeof d !== 'object' || Array.isArray(d)) {
      throw new ApiError('malformed_payload', `The \`json\` payload provided is malformed. \`Couldn't serialize document value: expected an object, found ${JSON.stringify(d)}\`.`);
    }
  }
  return list as Doc[];
}

const ID_RE = /^[A-Za-z0-9_-]+$/;

/** Canonical id key, or an invalid_document_id error. */
export function documentId(v: unknown): string {
  if (typeof v === 'number' && Number.isInteger(v)) return String(v);
  if (typeof v === 'string' && ID_RE.test(v) && Buffer.byteLength(v) <= 511) return v;
  throw new ApiError('invalid_document_id', `Document identifier \`${JSON.stringify(v)}\` is invalid. A document identifier can be of type integer or string, only composed of alphanumeric characters (a-z A-Z 0-9), hyphens (-) and underscores (_), and can not be more than 511 bytes.`);
}

/** Decides the primary key (existing, given, or inferred from the first document) and checks every id. */
export function resolvePrimaryKey(ix: SearchIndex, docs: Doc[], given: string | null): string {
  let pk = ix.primaryKey;
  if (pk && given && given !== pk) throw new ApiError('index_primary_key_already_exists', `Index \`${ix.uid}\`: Index already has a primary key: \`${pk}\`.`);
  if (!pk) pk = given;
  if (!pk && docs.length) {
    const candidates = Object.keys(docs[0]).filter((k) => k.toLowerCase().endsWith('id'));
    if (candidates.length === 0) throw new ApiError('index_primary_key_no_candidate_found', `Index \`${ix.uid}\`: The primary key inference failed as the engine did not find any field ending with \`id\` in its name. Please specify the primary key manually using the \`primaryKey\` query parameter.`);
    if (candidates.length > 1) throw new ApiError('index_primary_key_multiple_candidates_found', `Index \`${ix.uid}\`: The primary key inference failed as the engine found ${candidates.length} fields ending with \`id\` in their names: ${candidates.map((c) => `'${c}'`).join(' and ')}. Please specify the primary key manually using the \`primaryKey\` query parameter.`);
    pk = candidates[0];
  }
  if (!pk) return '';
  for (const d of docs) {
    if (!(pk in d)) throw new ApiError('missing_document_id', `Index \`${ix.uid}\`: Document doesn't have a \`${pk}\` attribute: \`${JSON.stringify(d)}\`.`);
    documentId(d[pk]);
  }
  return pk;
}
