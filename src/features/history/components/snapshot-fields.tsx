import type { ReactNode } from 'react';
import { fieldLabels } from '@shared/review/fields';
import type { EntityKind } from '@shared/review/types';

const long = new Set(['diplomatic', 'normalised', 'translation', 'commentary', 'rightsStatement']);

function show(field: string, value: unknown): ReactNode {
  if (value == null || value === '' || (Array.isArray(value) && value.length === 0)) return <em className="text-ink-muted">not given</em>;
  if (Array.isArray(value)) {
    return (
      <ul className="list-disc pl-5">
        {value.map((item, i) => (
          <li key={i}>{describe(field, item)}</li>
        ))}
      </ul>
    );
  }
  if (typeof value === 'object') return describe(field, value);
  return long.has(field) ? <p className="transcription">{String(value)}</p> : String(value);
}

function describe(field: string, item: unknown): string {
  if (item == null || typeof item !== 'object') return String(item);
  const o = item as Record<string, unknown>;
  if (field === 'creators') return `${String(o.name)} (${String(o.role)})`;
  if (field === 'mentions') return `${String(o.term)} [${String(o.language)}] → ${String(o.sizeSlug)} (${String(o.certainty)})`;
  if (field === 'pitchTags') return `“${String(o.statement)}” — a′ = ${String(o.aHz)} Hz (${String(o.derivation)})`;
  if (field === 'publication') return [o.publisher, o.place, o.edition].filter(Boolean).join(', ');
  return JSON.stringify(item);
}

export interface SnapshotFieldsProps {
  kind: EntityKind;
  snapshot: Record<string, unknown>;
  /** Controls beside each field's label, e.g. a comment button; each field has the id `field-<name>`. */
  fieldAction?: (field: string, label: string) => ReactNode;
  /** Notes shown under a field, e.g. an editor's comment on it. */
  fieldNotes?: (field: string) => ReactNode;
}

/** The content of a source or excerpt at one version, every field labelled. */
export function SnapshotFields({ kind, snapshot, fieldAction, fieldNotes }: SnapshotFieldsProps) {
  return (
    <dl className="divide-y divide-rule rounded-soft border border-rule bg-paper-raised">
      {Object.entries(fieldLabels[kind]).map(([field, label]) => (
        <div key={field} id={`field-${field}`} className="grid scroll-mt-24 gap-1 px-4 py-3 sm:grid-cols-[12rem_1fr]">
          <dt className="text-sm font-semibold text-ink">
            {label}
            {fieldAction && <div className="mt-1">{fieldAction(field, label)}</div>}
          </dt>
          <dd className="min-w-0 break-words">
            {show(field, snapshot[field])}
            {fieldNotes?.(field)}
          </dd>
        </div>
      ))}
    </dl>
  );
}
