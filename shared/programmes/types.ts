/** Response shapes of the programmes API (server presenters return exactly these). */
import type { FormattedEntry } from '../citations/api';
import type { MarkerProblem } from './markers';
import type { PerformerFields, PieceFields, Visibility } from './schema';

export interface ProgrammeSummary {
  id: string;
  title: string;
  performanceDate: string | null;
  venue: string | null;
  visibility: Visibility;
  pieceCount: number;
  updatedAt: string;
}

export interface ProgrammeView extends ProgrammeSummary {
  performers: PerformerFields[];
  pieces: PieceFields[];
  notesMarkdown: string;
  citationStyle: string;
  /** Present to the owner while shared: the path of the read-only page (`/p/<token>`). */
  sharePath: string | null;
  version: number;
  createdAt: string;
  /** Only on the shared page: whose programme it is. */
  ownerName?: string;
}

export interface RenderedNote {
  number: number;
  /** Formatted note in the style's HTML (sanitised). */
  html: string;
  text: string;
}

export interface BibliographyEntry {
  id: string;
  html: string;
  text: string;
}

/** POST /api/programmes/preview and …/:id/preview. */
export interface ProgrammePreview {
  /** The notes as HTML with numbered footnote references (or in-text citations) and problems marked. */
  html: string;
  notes: RenderedNote[];
  bibliography: BibliographyEntry[];
  problems: MarkerProblem[];
  styleKind: 'note' | 'in-text';
  entries?: FormattedEntry[];
}
