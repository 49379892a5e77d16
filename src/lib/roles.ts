import type { Role } from '@shared/schemas/auth';

export const roleLabels: Record<Role, string> = {
  reader: 'Reader',
  contributor: 'Contributor',
  editor: 'Editor',
  admin: 'Admin',
};

export const roleDescriptions: Record<Role, string> = {
  reader: 'Search and read approved sources, export citations and keep programmes.',
  contributor: 'Everything a reader does, plus cataloguing sources, uploading facsimiles and transcribing excerpts for review.',
  editor: 'Everything a contributor does, plus reviewing submissions and keeping the concordance of instrument terms.',
  admin: 'Everything an editor does, plus managing accounts, mail and the search index.',
};

/** Roles that may add material. */
export const contributorRoles: readonly Role[] = ['contributor', 'editor', 'admin'];
/** Roles that may review submissions. */
export const editorRoles: readonly Role[] = ['editor', 'admin'];
export const adminRoles: readonly Role[] = ['admin'];
