import { useFormContext } from 'react-hook-form';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { TextareaField } from '@/components/textarea-field';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { emptyToNull, excerptFieldLabels as labels, excerptFormId, type ExcerptFormValues } from './values';

const id = (path: string) => fieldDomId(excerptFormId, path);

export function TextFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  return (
    <FormSection title="Text">
      <TextareaField
        id={id('diplomatic')}
        label={labels.diplomatic}
        hint="Letter for letter as written: keep spelling, capitals, abbreviations and line breaks."
        serif
        rows={8}
        spellCheck={false}
        error={errors.diplomatic?.message}
        {...register('diplomatic')}
      />
      <TextareaField
        id={id('normalised')}
        label={labels.normalised}
        labelSuffix="(optional)"
        hint="Abbreviations expanded, spelling and punctuation regularised, so the passage is easy to read and search."
        serif
        rows={6}
        error={errors.normalised?.message}
        {...register('normalised')}
      />
      <TextareaField
        id={id('translation')}
        label={labels.translation}
        labelSuffix="(optional)"
        serif
        rows={6}
        error={errors.translation?.message}
        {...register('translation')}
      />
      <div className="grid gap-3 sm:grid-cols-[10rem_1fr]">
        <TextField
          id={id('translationLanguage')}
          label={labels.translationLanguage}
          hint="BCP 47, e.g. en"
          spellCheck={false}
          error={errors.translationLanguage?.message}
          {...register('translationLanguage', { setValueAs: emptyToNull })}
        />
        <TextField
          id={id('translator')}
          label={labels.translator}
          hint="Credited beside the translation."
          error={errors.translator?.message}
          {...register('translator')}
        />
      </div>
    </FormSection>
  );
}
