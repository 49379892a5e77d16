import { useId, useState } from 'react';
import { Controller, useFormContext, useWatch } from 'react-hook-form';
import { limits } from '@shared/catalogue/schemas';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { EdtfInterpretation } from '@/features/contribute/components/edtf-interpretation';
import { FormSection } from '@/features/contribute/components/form-section';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { excerptFieldLabels as labels, excerptFormId, type ExcerptFormValues } from './values';

const id = (path: string) => fieldDomId(excerptFormId, path);

function TopicsInput({ value, onChange }: { value: string[]; onChange: (topics: string[]) => void }) {
  const [text, setText] = useState('');
  const add = () => {
    const topic = text.trim().slice(0, 60);
    if (topic && !value.includes(topic) && value.length < limits.topics) onChange([...value, topic]);
    setText('');
  };
  return (
    <div>
      <label htmlFor={id('topics')} className="block text-sm font-medium text-ink">
        {labels.topics} <span className="font-normal text-ink-muted">(optional)</span>
      </label>
      <p id={`${id('topics')}-hint`} className="mt-1 text-sm text-ink-muted">
        Short subjects such as “tuning”, “purchase”, “ensemble”; press Enter to add.
      </p>
      {value.length > 0 && (
        <ul className="mt-2 flex flex-wrap gap-2" aria-label="Topics chosen">
          {value.map((topic) => (
            <li key={topic} className="inline-flex items-center gap-1 rounded-full border border-rule-strong bg-paper px-3 py-0.5 text-sm">
              {topic}
              <button type="button" aria-label={`Remove topic ${topic}`} className="px-1 text-ink-muted hover:text-danger" onClick={() => onChange(value.filter((t) => t !== topic))}>
                <span aria-hidden="true">×</span>
              </button>
            </li>
          ))}
        </ul>
      )}
      <div className="mt-2 flex gap-2">
        <input
          id={id('topics')}
          value={text}
          aria-describedby={`${id('topics')}-hint`}
          onChange={(e) => setText(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter' || e.key === ',') {
              e.preventDefault();
              add();
            }
          }}
          className="field-control max-w-64"
        />
        <Button size="sm" variant="secondary" onClick={add} disabled={!text.trim()}>
          Add
        </Button>
      </div>
    </div>
  );
}

export function DateTopicsFields({ sourceDateLabel }: { sourceDateLabel: string }) {
  const {
    register,
    control,
    setValue,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  const dateEdtf = useWatch({ control, name: 'dateEdtf' });
  const own = typeof dateEdtf === 'string';
  const group = useId();

  return (
    <FormSection title="Date and topics">
      <fieldset>
        <legend className="text-sm font-medium text-ink">Date of the passage</legend>
        <div className="mt-2 space-y-1">
          <label className="flex items-center gap-2 text-sm">
            <input type="radio" name={group} checked={!own} onChange={() => setValue('dateEdtf', null, { shouldDirty: true })} className="accent-accent" />
            Same as the source <span className="figures text-ink-muted">({sourceDateLabel})</span>
          </label>
          <label className="flex items-center gap-2 text-sm">
            <input type="radio" name={group} checked={own} onChange={() => setValue('dateEdtf', '', { shouldDirty: true })} className="accent-accent" />
            Its own date, e.g. an entry in an account book
          </label>
        </div>
      </fieldset>
      {own && (
        <div>
          <TextField
            id={id('dateEdtf')}
            label={labels.dateEdtf}
            className="figures max-w-72"
            autoComplete="off"
            spellCheck={false}
            error={errors.dateEdtf?.message}
            {...register('dateEdtf')}
          />
          <EdtfInterpretation value={dateEdtf ?? ''} />
        </div>
      )}
      <Controller control={control} name="topics" render={({ field }) => <TopicsInput value={field.value ?? []} onChange={field.onChange} />} />
    </FormSection>
  );
}
