import type { SourceInput } from '@shared/catalogue/schemas';
import type { ImportFormat } from '@shared/citations/import';
import type { ImportPreview, ImportResult } from '@shared/citations/import-types';
import { api } from '@/lib/api';

export function previewText(text: string, format?: ImportFormat) {
  return api.post<{ data: ImportPreview }>('/api/import/preview', { text, ...(format ? { format } : {}) }).then((r) => r.data);
}

export function previewFile(file: File, format?: ImportFormat) {
  const form = new FormData();
  form.append('file', file);
  if (format) form.append('format', format);
  return api.upload<{ data: ImportPreview }>('/api/import/preview', form).then((r) => r.data);
}

export function importSources(entries: SourceInput[]) {
  return api.post<{ data: ImportResult }>('/api/import', { entries }).then((r) => r.data);
}
