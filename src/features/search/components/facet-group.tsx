import { useId } from 'react';
import { Checkbox } from '@/components/checkbox';

export interface FacetGroupProps {
  title: string;
  /** Values to offer, in display order, with their labels. */
  values: readonly { value: string; label: string }[];
  counts: Record<string, number>;
  selected: readonly string[];
  onChange: (selected: string[]) => void;
}

/** A titled list of checkboxes, each with its count; values with no matches are left out unless ticked. */
export function FacetGroup({ title, values, counts, selected, onChange }: FacetGroupProps) {
  const id = useId();
  const shown = values.filter((v) => (counts[v.value] ?? 0) > 0 || selected.includes(v.value));
  if (!shown.length) return null;
  const toggle = (value: string, on: boolean) =>
    onChange(on ? [...selected, value] : selected.filter((v) => v !== value));
  return (
    <fieldset className="min-w-0" aria-describedby={`${id}-hint`}>
      <legend className="text-sm font-semibold text-ink">{title}</legend>
      <p id={`${id}-hint`} className="sr-only">Ticking several values finds passages with any of them.</p>
      <ul className="mt-2 space-y-1.5">
        {shown.map((v) => (
          <li key={v.value} className="flex items-start justify-between gap-3">
            <Checkbox
              label={v.label}
              checked={selected.includes(v.value)}
              onChange={(e) => toggle(v.value, e.target.checked)}
            />
            <span className="figures pt-0.5 text-sm text-ink-muted">
              {counts[v.value] ?? 0}
              <span className="sr-only"> passages</span>
            </span>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}
