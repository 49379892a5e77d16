import type { ProgrammeSummary, ProgrammeView } from '@shared/programmes/types';
import type { Programme } from '../models/programme';

const iso = (date: Date | string) => new Date(date).toISOString();

export function presentProgrammeSummary(programme: Programme): ProgrammeSummary {
  return {
    id: programme.publicId,
    title: programme.title,
    performanceDate: programme.performanceDate,
    venue: programme.venue,
    visibility: programme.visibility,
    pieceCount: programme.pieces.length,
    updatedAt: iso(programme.updatedAt),
  };
}

/** The owner's view: everything, with the share path while shared. */
export function presentProgramme(programme: Programme): ProgrammeView {
  return {
    ...presentProgrammeSummary(programme),
    performers: programme.performers,
    pieces: programme.pieces,
    notesMarkdown: programme.notesMarkdown,
    citationStyle: programme.citationStyle,
    sharePath: programme.shareToken ? `/p/${programme.shareToken}` : null,
    version: programme.version,
    createdAt: iso(programme.createdAt),
  };
}

/** The shared page's view: read-only, no token echo, the owner's display name as credit. */
export function presentSharedProgramme(programme: Programme): ProgrammeView {
  return { ...presentProgramme(programme), sharePath: null, ownerName: programme.owner?.displayName };
}
