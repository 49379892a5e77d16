import type { FieldErrors, FieldValues } from 'react-hook-form';

export interface FlatError {
  /** Dotted path as react-hook-form and the server name it: `title`, `languages.0`, `pitchTags.0.aHz`. */
  path: string;
  message: string;
}

/** All messages of a react-hook-form error tree, in field order. */
export function flattenErrors<T extends FieldValues>(errors: FieldErrors<T>, prefix = ''): FlatError[] {
  const out: FlatError[] = [];
  const visit = (node: unknown, path: string) => {
    if (!node || typeof node !== 'object') return;
    const record = node as Record<string, unknown>;
    if (typeof record.message === 'string' && record.message && 'type' in record) out.push({ path, message: record.message });
    for (const [key, child] of Object.entries(record)) {
      if (key === 'ref' || key === 'message' || key === 'type' || key === 'types') continue;
      visit(child, key === 'root' ? path : path ? `${path}.${key}` : key);
    }
  };
  visit(errors, prefix);
  return out;
}

/** The id an input gets for a field path, so summaries can link to it. */
export function fieldDomId(form: string, path: string): string {
  return `${form}-${path.replace(/\./g, '-')}`;
}
