import { useFormContext, useWatch } from 'react-hook-form';
import { calendarNotes, type CalendarNote } from '@shared/catalogue/vocabulary';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { EdtfInterpretation } from '@/features/contribute/components/edtf-interpretation';
import { FormSection } from '@/features/contribute/components/form-section';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { OldStyleHelper } from './old-style-helper';
import { sourceFieldLabels as labels, sourceFormId, type SourceFormValues } from './values';

const id = (path: string) => fieldDomId(sourceFormId, path);

const calendarLabels: Record<CalendarNote, string> = {
  unstated: 'Not stated',
  'old-style': 'Old Style (Julian) in the source; converted here',
  'new-style': 'New Style (Gregorian) in the source',
};

export function DateFields() {
  const {
    register,
    control,
    setValue,
    formState: { errors },
  } = useFormContext<SourceFormValues>();
  const dateEdtf = useWatch({ control, name: 'dateEdtf' }) ?? '';

  return (
    <FormSection
      title="Date"
      description="Extended Date/Time Format (EDTF): 1700, 1700-02 (a month), 1701-02-21 (a day), 1700~ (about), 1700? (uncertain), 169X (the 1690s), 1700/1725 (between)."
    >
      <div>
        <TextField
          id={id('dateEdtf')}
          label={labels.dateEdtf}
          error={errors.dateEdtf?.message}
          className="figures max-w-72"
          autoComplete="off"
          spellCheck={false}
          {...register('dateEdtf')}
        />
        <EdtfInterpretation value={dateEdtf} />
      </div>
      <OldStyleHelper
        onUse={(edtf, julian) => {
          setValue('dateEdtf', edtf, { shouldDirty: true, shouldValidate: true });
          if (julian) setValue('calendarNote', 'old-style', { shouldDirty: true });
          document.getElementById(id('dateEdtf'))?.focus();
        }}
      />
      <Select
        id={id('calendarNote')}
        label={labels.calendarNote}
        hint="Whether the source itself dated by the Julian or the Gregorian calendar."
        error={errors.calendarNote?.message}
        options={calendarNotes.map((note) => ({ value: note, label: calendarLabels[note] }))}
        containerClassName="max-w-md"
        {...register('calendarNote')}
      />
    </FormSection>
  );
}
