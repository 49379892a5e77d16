import { useEffect, useState, type FormEvent } from 'react';
import { sourceTypeLabels, sourceTypes, workflowStates, type SourceType, type WorkflowState } from '@shared/catalogue/vocabulary';
import { stateLabels } from '@shared/catalogue/workflow';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';

export interface SourceFilterValues {
  q: string;
  type: SourceType | '';
  status: WorkflowState | '';
  from: string;
  to: string;
  lang: string;
  mine: boolean;
}

export interface SourceFiltersProps {
  values: SourceFilterValues;
  onChange: (values: SourceFilterValues) => void;
  /** Contributors and editors may filter by workflow state and by their own sources. */
  showContributorFilters: boolean;
}

const languageOptions = [
  { value: 'en', label: 'English' },
  { value: 'fr', label: 'French' },
  { value: 'de', label: 'German' },
  { value: 'nl', label: 'Dutch' },
  { value: 'it', label: 'Italian' },
  { value: 'la', label: 'Latin' },
  { value: 'es', label: 'Spanish' },
];

function yearError(value: string): string | undefined {
  if (!value) return undefined;
  return /^\d{4}$/.test(value) && Number(value) >= 1000 && Number(value) <= 2100 ? undefined : 'Write a year between 1000 and 2100, e.g. 1700';
}

/** Text, year range and the other filters; text and years apply on submit, choices at once. */
export function SourceFilters({ values, onChange, showContributorFilters }: SourceFiltersProps) {
  const [text, setText] = useState({ q: values.q, from: values.from, to: values.to });
  const [submitted, setSubmitted] = useState(false);
  useEffect(() => setText({ q: values.q, from: values.from, to: values.to }), [values.q, values.from, values.to]);

  const fromError = yearError(text.from);
  const toError =
    yearError(text.to) ?? (text.from && text.to && !fromError && Number(text.to) < Number(text.from) ? 'The end year comes before the start year' : undefined);

  const apply = (changes: Partial<SourceFilterValues>) => onChange({ ...values, ...text, ...changes });

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSubmitted(true);
    if (fromError || toError) return;
    apply({ q: text.q.trim() });
  };

  return (
    <form role="search" aria-label="Filter sources" noValidate onSubmit={onSubmit} className="mb-5 rounded-soft border border-rule bg-paper-raised p-4">
      <div className="flex flex-wrap items-start gap-3">
        <TextField
          label="Title, creator, place or shelfmark"
          type="search"
          value={text.q}
          onChange={(event) => setText((t) => ({ ...t, q: event.target.value }))}
          containerClassName="min-w-[16rem] flex-[2]"
        />
        <Select label="Kind" value={values.type} onChange={(e) => apply({ type: e.target.value as SourceType | '' })} containerClassName="w-52">
          <option value="">All kinds</option>
          {sourceTypes.map((type) => (
            <option key={type} value={type}>
              {sourceTypeLabels[type]}
            </option>
          ))}
        </Select>
        <Select label="Language" value={values.lang} onChange={(e) => apply({ lang: e.target.value })} containerClassName="w-36">
          <option value="">Any</option>
          {languageOptions.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </Select>
        <fieldset className="flex gap-2">
          <legend className="sr-only">Years</legend>
          <TextField
            label="From year"
            inputMode="numeric"
            value={text.from}
            onChange={(e) => setText((t) => ({ ...t, from: e.target.value.trim() }))}
            error={submitted ? fromError : undefined}
            className="figures"
            containerClassName="w-28"
          />
          <TextField
            label="To year"
            inputMode="numeric"
            value={text.to}
            onChange={(e) => setText((t) => ({ ...t, to: e.target.value.trim() }))}
            error={submitted ? toError : undefined}
            className="figures"
            containerClassName="w-28"
          />
        </fieldset>
        {showContributorFilters && (
          <Select label="State" value={values.status} onChange={(e) => apply({ status: e.target.value as WorkflowState | '' })} containerClassName="w-52">
            <option value="">Any state</option>
            {workflowStates.map((state) => (
              <option key={state} value={state}>
                {stateLabels[state]}
              </option>
            ))}
          </Select>
        )}
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-4">
        <Button type="submit" variant="secondary">
          Apply
        </Button>
        {showContributorFilters && (
          <Checkbox label="Only sources I contributed" checked={values.mine} onChange={(e) => apply({ mine: e.target.checked })} />
        )}
      </div>
    </form>
  );
}
