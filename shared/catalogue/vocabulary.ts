/** Closed vocabularies of the catalogue, shared by database enums, forms and API. */

export const sourceTypes = [
  'treatise',
  'tutor',
  'account',
  'inventory',
  'diary',
  'letter',
  'court-record',
  'music-preface',
  'makers-list',
  'newspaper',
  'other',
] as const;
export type SourceType = (typeof sourceTypes)[number];

export const sourceTypeLabels: Record<SourceType, string> = {
  treatise: 'Treatise',
  tutor: 'Tutor',
  account: 'Household or court account',
  inventory: 'Inventory',
  diary: 'Diary',
  letter: 'Letter',
  'court-record': 'Court or chapel record',
  'music-preface': 'Preface to printed music',
  'makers-list': "Maker's list",
  newspaper: 'Newspaper',
  other: 'Other',
};

/** Printed sources get publication data and cite as books; the rest are archival documents. */
export const printedSourceTypes: readonly SourceType[] = ['treatise', 'tutor', 'music-preface', 'newspaper'];

export const creatorRoles = ['author', 'compiler', 'scribe', 'maker', 'editor', 'translator'] as const;
export type CreatorRole = (typeof creatorRoles)[number];

export const calendarNotes = ['unstated', 'old-style', 'new-style'] as const;
export type CalendarNote = (typeof calendarNotes)[number];

export const facsimileAccessLevels = ['public', 'signed-in', 'hidden'] as const;
export type FacsimileAccess = (typeof facsimileAccessLevels)[number];

export const locatorTypes = ['page', 'folio', 'signature', 'column', 'plate'] as const;
export type LocatorType = (typeof locatorTypes)[number];

export const certainties = ['certain', 'probable', 'conjectural'] as const;
export type Certainty = (typeof certainties)[number];

export const pitchDerivations = ['stated', 'measured', 'inferred'] as const;
export type PitchDerivation = (typeof pitchDerivations)[number];

export const workflowStates = ['draft', 'submitted', 'approved', 'returned', 'rejected', 'withdrawn'] as const;
export type WorkflowState = (typeof workflowStates)[number];

export const reviewDecisions = ['approve', 'return', 'reject'] as const;
export type ReviewDecision = (typeof reviewDecisions)[number];
