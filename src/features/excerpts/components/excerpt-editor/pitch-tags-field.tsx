import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { limits } from '@shared/catalogue/schemas';
import { pitchDerivations } from '@shared/catalogue/vocabulary';
import { Button } from '@/components/button';
import { FieldError } from '@/components/field';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { TextareaField } from '@/components/textarea-field';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { cn } from '@/lib/cn';
import { PitchReading } from '../pitch-reading';
import { emptyToNull, excerptFormId, toNumber, type ExcerptFormValues } from './values';

const id = (path: string) => fieldDomId(excerptFormId, path);

const derivationLabels = {
  stated: 'Stated by the source',
  measured: 'Measured from a surviving instrument',
  inferred: 'Inferred by the contributor',
} as const;

/** The a′ input with its live reading in cents and the nearest standard. */
export function AHzInput({ index }: { index: number }) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  const value = useWatch({ control, name: `pitchTags.${index}.aHz` });
  const inputId = id(`pitchTags.${index}.aHz`);
  const error = errors.pitchTags?.[index]?.aHz?.message;
  return (
    <div>
      <label htmlFor={inputId} className="block text-sm font-medium text-ink">
        Tag {index + 1}: a′ in Hz
      </label>
      <div className="mt-1 flex items-center gap-2">
        <input
          id={inputId}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={[`${inputId}-reading`, error ? `${inputId}-error` : ''].filter(Boolean).join(' ')}
          className={cn('field-control figures max-w-32', error && 'border-danger')}
          {...register(`pitchTags.${index}.aHz`, { setValueAs: toNumber(undefined) })}
        />
        <span aria-hidden="true" className="text-ink-muted">
          Hz
        </span>
      </div>
      <PitchReading value={value} id={`${inputId}-reading`} />
      <FieldError id={error ? `${inputId}-error` : undefined} message={error} />
    </div>
  );
}

export function PitchTagsField() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  const tags = useFieldArray({ control, name: 'pitchTags' });

  return (
    <FormSection title="Pitch" description="What the passage says about pitch, and the a′ it implies. 415 Hz is about a semitone below modern pitch.">
      {tags.fields.length === 0 && <p className="text-sm text-ink-muted">No pitch statement yet.</p>}
      <ol className="space-y-4">
        {tags.fields.map((field, index) => {
          const e = errors.pitchTags?.[index];
          return (
            <li key={field.id} className="space-y-3 rounded-soft border border-rule p-3">
              <TextareaField
                id={id(`pitchTags.${index}.statement`)}
                label={`Tag ${index + 1}: what the source says`}
                serif
                rows={2}
                error={e?.statement?.message}
                {...register(`pitchTags.${index}.statement`)}
              />
              <AHzInput index={index} />
              <Select
                id={id(`pitchTags.${index}.derivation`)}
                label={`Tag ${index + 1}: how a′ was found`}
                error={e?.derivation?.message}
                options={pitchDerivations.map((d) => ({ value: d, label: derivationLabels[d] }))}
                containerClassName="max-w-sm"
                {...register(`pitchTags.${index}.derivation`)}
              />
              <TextField
                id={id(`pitchTags.${index}.note`)}
                label={`Tag ${index + 1}: note`}
                labelSuffix="(optional)"
                error={e?.note?.message}
                {...register(`pitchTags.${index}.note`, { setValueAs: emptyToNull })}
              />
              <Button variant="quiet" size="sm" onClick={() => tags.remove(index)}>
                Remove pitch tag {index + 1}
              </Button>
            </li>
          );
        })}
      </ol>
      <Button
        variant="secondary"
        size="sm"
        disabled={tags.fields.length >= limits.pitchTags}
        onClick={() => tags.append({ statement: '', aHz: undefined as unknown as number, derivation: 'stated', note: '' })}
      >
        Add a pitch tag
      </Button>
    </FormSection>
  );
}
