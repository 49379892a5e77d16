import { Controller, useFormContext } from 'react-hook-form';
import { limits } from '@shared/catalogue/schemas';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { LanguageTagsField } from '@/features/contribute/components/language-tags-field';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { sourceFieldLabels as labels, sourceFormId, type SourceFormValues } from './values';

const id = (path: string) => fieldDomId(sourceFormId, path);

export function PlaceLanguageFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<SourceFormValues>();
  const languageErrors = errors.languages;
  const itemErrors = Array.isArray(languageErrors) ? languageErrors.map((e) => e?.message as string | undefined) : [];

  return (
    <FormSection title="Place and languages">
      <TextField
        id={id('place')}
        label={labels.place}
        labelSuffix="(optional)"
        hint="Where it was written or printed, as a modern place name."
        error={errors.place?.message}
        {...register('place')}
      />
      <Controller
        control={control}
        name="languages"
        render={({ field }) => (
          <LanguageTagsField
            id={id('languages')}
            label={labels.languages}
            value={field.value ?? []}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={languageErrors?.message ?? languageErrors?.root?.message}
            itemErrors={itemErrors}
            max={limits.languages}
          />
        )}
      />
    </FormSection>
  );
}
