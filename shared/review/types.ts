import type { Certainty, ReviewDecision, SourceType, WorkflowState } from '../catalogue/vocabulary';
import type { FacsimileView } from '../catalogue/types';

/** What a review, a revision or a permalink is about. */
export const entityKinds = ['source', 'excerpt'] as const;
export type EntityKind = (typeof entityKinds)[number];

export interface Credit {
  id: number;
  displayName: string;
}

export interface FieldComment {
  field: string;
  comment: string;
}

export interface ReviewRecord {
  id: number;
  kind: EntityKind;
  /** The version the editor decided on. */
  version: number;
  decision: ReviewDecision;
  comment: string | null;
  fieldComments: FieldComment[];
  editor: Credit | null;
  createdAt: string;
}

/** One row of the review queue: a submitted source or excerpt. */
export interface QueueRow {
  kind: EntityKind;
  id: string;
  title: string;
  /** For excerpts: the locator, e.g. "fol. 12v"; null for sources. */
  locator: string | null;
  source: { id: string; title: string; sourceType: SourceType };
  languages: string[];
  contributor: Credit | null;
  version: number;
  status: WorkflowState;
  /** Submitted (or last changed while submitted) at. */
  waitingSince: string;
  ageDays: number;
  /** Sources: how many of their excerpts are awaiting review too. */
  submittedExcerpts: number | null;
  /** True when this version was seen before: a resubmission after a return. */
  resubmitted: boolean;
}

export type StateCounts = Record<EntityKind, Record<WorkflowState, number>>;

export interface QueueResponse {
  data: QueueRow[];
  total: number;
  page: number;
  perPage: number;
  counts: StateCounts;
}

export interface TextPart {
  value: string;
  added?: boolean;
  removed?: boolean;
}

/** What changed in one field between two versions. */
export type FieldDiff =
  | { field: string; label: string; type: 'text'; parts: TextPart[] }
  | { field: string; label: string; type: 'list'; items: { value: string; change: 'added' | 'removed' | 'same' }[] }
  | { field: string; label: string; type: 'value'; before: string | null; after: string | null };

export interface VersionDiff {
  kind: EntityKind;
  id: string;
  /** null when there is no earlier version to compare with (everything is new). */
  from: number | null;
  to: number;
  changes: FieldDiff[];
}

export interface RevisionSummary {
  version: number;
  status: WorkflowState | null;
  reason: string | null;
  author: Credit | null;
  createdAt: string;
  /** This version's content is what readers saw as approved. */
  approved: boolean;
}

export interface VersionSnapshot {
  kind: EntityKind;
  id: string;
  version: number;
  currentVersion: number;
  title: string;
  createdAt: string;
  author: Credit | null;
  reason: string | null;
  snapshot: Record<string, unknown>;
}

/** The source's facsimile and the page of this excerpt in it (1-based), when recorded. */
export interface FacsimileInfo {
  view: FacsimileView;
  page: number | null;
}

export interface ReviewDetail {
  kind: EntityKind;
  id: string;
  title: string;
  status: WorkflowState;
  statusLabel: string;
  version: number;
  approvedVersion: number | null;
  contributor: Credit | null;
  source: { id: string; title: string; status: WorkflowState };
  /** The current content, as a snapshot. */
  item: Record<string, unknown>;
  facsimile: FacsimileInfo | null;
  /** Since the last approved version (or everything, for a first submission). */
  diff: VersionDiff;
  /** Since the version the last decision was about: what a resubmission fixed. Null before any decision. */
  sinceLastReview: VersionDiff | null;
  reviews: ReviewRecord[];
  /** Excerpts of a source, with their state, so the editor can open each. */
  excerpts: { id: string; locator: string; status: WorkflowState; version: number }[];
  abilities: { decide: boolean; reason: string | null };
}

export interface MySubmission {
  kind: EntityKind;
  id: string;
  title: string;
  source: { id: string; title: string };
  status: WorkflowState;
  statusLabel: string;
  version: number;
  updatedAt: string;
  /** The latest decision, with its comments: what to fix. */
  lastReview: ReviewRecord | null;
}

export interface ConcordanceSize {
  sizeSlug: string;
  sizeName: string;
  excerpts: number;
  certainty: Record<Certainty, number>;
  examples: string[];
}

export interface ConcordanceEntry {
  term: string;
  language: string;
  excerpts: number;
  sizes: ConcordanceSize[];
}

export interface ConcordanceChangeResult {
  affectedMentions: number;
  affectedExcerpts: string[];
}

/** A message the capture server stored (Outbox page). */
export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}
