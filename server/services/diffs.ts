import { diffArrays, diffWords } from 'diff';
import type { EntityKind, FieldDiff, TextPart } from '@shared/review/types';
import { fieldLabels, listFields, textFields } from '@shared/review/fields';

type Snapshot = Record<string, unknown>;

const str = (value: unknown) => (typeof value === 'string' ? value : value == null ? '' : String(value));

/** One readable line per list entry, so lists are compared entry by entry. */
function listItem(field: string, item: unknown): string {
  if (item == null || typeof item !== 'object') return str(item);
  const o = item as Record<string, unknown>;
  switch (field) {
    case 'creators':
      return `${str(o.name)} (${str(o.role)})`;
    case 'mentions':
      return `${str(o.term)} [${str(o.language)}] → ${str(o.sizeSlug)}, ${str(o.certainty)}${o.note ? ` — ${str(o.note)}` : ''}`;
    case 'pitchTags':
      return `“${str(o.statement)}”: a′ = ${Number(o.aHz)} Hz, ${str(o.derivation)}${o.note ? ` — ${str(o.note)}` : ''}`;
    default:
      return JSON.stringify(item);
  }
}

function scalar(field: string, value: unknown): string | null {
  if (value == null || value === '') return null;
  if (field === 'publication' && typeof value === 'object') {
    const p = value as Record<string, unknown>;
    const parts = [p.publisher, p.place, p.edition].filter(Boolean).map(str);
    return parts.length ? parts.join(', ') : null;
  }
  return typeof value === 'object' ? JSON.stringify(value) : str(value);
}

const asList = (field: string, value: unknown) => (Array.isArray(value) ? value.map((item) => listItem(field, item)) : []);

/** Word-level parts for texts; insertions and deletions carry `added`/`removed`. */
export function diffText(before: string, after: string): TextPart[] {
  return diffWords(before, after).map((c) => ({ value: c.value, ...(c.added ? { added: true } : {}), ...(c.removed ? { removed: true } : {}) }));
}

function diffField(kind: EntityKind, field: string, before: unknown, after: unknown): FieldDiff | null {
  const label = fieldLabels[kind][field] ?? field;
  if (listFields.includes(field)) {
    const a = asList(field, before);
    const b = asList(field, after);
    if (JSON.stringify(a) === JSON.stringify(b)) return null;
    const items = diffArrays(a, b).flatMap((c) =>
      c.value.map((value) => ({ value, change: c.added ? ('added' as const) : c.removed ? ('removed' as const) : ('same' as const) })),
    );
    return { field, label, type: 'list', items };
  }
  if (textFields.includes(field)) {
    const a = str(before);
    const b = str(after);
    if (a === b) return null;
    return { field, label, type: 'text', parts: diffText(a, b) };
  }
  const a = scalar(field, before);
  const b = scalar(field, after);
  if (a === b) return null;
  return { field, label, type: 'value', before: a, after: b };
}

/**
 * What changed in the content fields between two snapshots, in reading order.
 * With no `before`, every filled field counts as added (a first submission).
 */
export function diffSnapshots(kind: EntityKind, before: Snapshot | null, after: Snapshot): FieldDiff[] {
  const changes: FieldDiff[] = [];
  for (const field of Object.keys(fieldLabels[kind])) {
    const change = diffField(kind, field, before ? before[field] : undefined, after[field]);
    if (change) changes.push(change);
  }
  return changes;
}
