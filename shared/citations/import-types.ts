import type { SourceInput } from '../catalogue/schemas';
import type { ImportFormat } from './import';

export interface ImportDuplicate {
  /** The existing source's id, or null for a duplicate within the same import. */
  id: string | null;
  title: string;
  status: string | null;
  message: string;
}

/** One parsed entry of POST /api/import/preview. */
export interface ImportPreviewEntry {
  index: number;
  /** Line of the text where the entry starts. */
  line: number | null;
  /** The BibTeX key or RIS ID, when there was one. */
  key: string | null;
  fields: SourceInput;
  /** Field → message, as the import would report it; null when the entry can be imported as is. */
  errors: Record<string, string> | null;
  duplicates: ImportDuplicate[];
}

export interface ImportPreview {
  format: ImportFormat;
  entries: ImportPreviewEntry[];
}

export interface ImportResult {
  created: { id: string; title: string }[];
}
