/**
 * Response shapes of the catalogue API (sources, excerpts, facsimiles, sizes, revisions).
 * The server's presenters return exactly these; the client imports them from here.
 */
import type {
  CalendarNote,
  Certainty,
  CreatorRole,
  FacsimileAccess,
  LocatorType,
  PitchDerivation,
  SourceType,
  WorkflowState,
} from './vocabulary';

export interface Credit {
  id: number;
  displayName: string;
}

export interface Paged<T> {
  data: T[];
  total: number;
  page: number;
  perPage: number;
}

export interface DateView {
  edtf: string;
  label: string;
  /** ISO days bounding the date, for range search. */
  earliest: string;
  latest: string;
}

export interface SourceSummary {
  /** The public id (e.g. `S7K2QX9A`), used in URLs and citations. */
  id: string;
  title: string;
  sourceType: SourceType;
  creators: { name: string; role: CreatorRole }[];
  date: DateView;
  place: string | null;
  languages: string[];
  holdingInstitution: string | null;
  shelfmark: string | null;
  status: WorkflowState;
  version: number;
  approvedVersion: number | null;
  contributor: Credit | null;
  createdAt: string;
  updatedAt: string;
}

export interface SourceDetail extends SourceSummary {
  calendarNote: CalendarNote;
  publication: { publisher: string | null; place: string | null; edition: string | null } | null;
  externalUrl: string | null;
  rightsStatement: string | null;
  facsimileAccess: FacsimileAccess;
  submittedAt: string | null;
  facsimiles: FacsimileView[];
  excerpts: ExcerptSummary[];
  /** True when a reader sees the last approved version while a newer one awaits review. */
  showingApprovedVersion: boolean;
}

export interface SourceAbilities {
  update: boolean;
  submit: boolean;
  withdraw: boolean;
  reopen: boolean;
  upload: boolean;
  addExcerpt: boolean;
  review: boolean;
  /** Editors may save changes to approved material without a new review (`publish: true`). */
  publish: boolean;
}

export interface LocatorView {
  type: LocatorType;
  value: string;
  /** As a citation prints it: `fol. 12v`, `pp. 23–24`. */
  label: string;
}

export interface ExcerptSummary {
  id: string;
  sourceId: string;
  locator: LocatorView;
  facsimilePage: number | null;
  /** The start of the diplomatic transcription. */
  snippet: string;
  date: DateView & { inherited: boolean };
  sizes: string[];
  aHz: number[];
  status: WorkflowState;
  version: number;
}

export interface MentionView {
  term: string;
  language: string;
  sizeSlug: string;
  sizeName: string;
  certainty: Certainty;
  note: string | null;
}

export interface PitchTagView {
  statement: string;
  aHz: number;
  /** 1200·log2(a′/440), rounded to 0.1. */
  centsFrom440: number;
  derivation: PitchDerivation;
  note: string | null;
}

export interface ExcerptDetail {
  id: string;
  source: SourceSummary;
  locator: LocatorView;
  facsimilePage: number | null;
  diplomatic: string;
  normalised: string | null;
  translation: string | null;
  translationLanguage: string | null;
  translator: string | null;
  /** Markdown as written. */
  commentary: string | null;
  /** The commentary rendered and sanitised: safe to insert as HTML. */
  commentaryHtml: string | null;
  /** Own date or, when `inherited`, the source's. */
  date: DateView & { inherited: boolean };
  /** The excerpt's own EDTF (null: takes the source's date). */
  dateEdtf: string | null;
  topics: string[];
  mentions: MentionView[];
  pitchTags: PitchTagView[];
  status: WorkflowState;
  version: number;
  approvedVersion: number | null;
  contributor: Credit | null;
  createdAt: string;
  updatedAt: string;
  showingApprovedVersion: boolean;
}

export interface ExcerptAbilities {
  update: boolean;
  review: boolean;
  publish: boolean;
}

export type ExtractionStatus = 'pending' | 'running' | 'done' | 'failed';

export interface FacsimileView {
  id: number;
  sourceId: string;
  originalName: string;
  mediaType: string;
  byteSize: number;
  sha256: string;
  pageCount: number | null;
  extractionStatus: ExtractionStatus;
  /** Pages whose text has been extracted so far. */
  extractionProgress: number;
  extractionError: string | null;
  fileUrl: string;
  uploadedBy: Credit | null;
  createdAt: string;
}

export interface FacsimileUploadResponse {
  data: FacsimileView;
  /** True when the same bytes were already uploaded to this source: nothing new was stored. */
  duplicate?: boolean;
}

export interface PageTextView {
  facsimileId: number;
  page: number;
  pageCount: number;
  text: string;
}

export interface RevisionSummary {
  version: number;
  authorId: number;
  author: { displayName: string } | null;
  reason: string | null;
  createdAt: string;
}

export interface RevisionDetail extends RevisionSummary {
  snapshot: Record<string, unknown>;
}

export interface InstrumentSizeView {
  slug: string;
  family: string;
  name: string;
  otherNames: string[];
  nominalNote: string;
  writtenOctaveOffset: number;
  range: { lowest: string; highest: string };
  hornbostelSachs: string;
  sortOrder: number;
}

export interface SourceResponse {
  data: SourceDetail;
  abilities: SourceAbilities;
}
export interface ExcerptResponse {
  data: ExcerptDetail;
  abilities: ExcerptAbilities;
}
export interface SubmitSourceResponse extends SourceResponse {
  /** Public ids of the excerpts submitted with the source. */
  submittedExcerpts: string[];
}
