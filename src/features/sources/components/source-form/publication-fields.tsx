import { useFormContext } from 'react-hook-form';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { sourceFieldLabels as labels, sourceFormId, type SourceFormValues } from './values';

const id = (path: string) => fieldDomId(sourceFormId, path);

/** Shown for printed kinds of source only. */
export function PublicationFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<SourceFormValues>();
  return (
    <FormSection title="Publication" description="For printed sources, as the imprint gives it.">
      <TextField
        id={id('publication.publisher')}
        label={labels['publication.publisher']}
        labelSuffix="(optional)"
        error={errors.publication?.publisher?.message}
        {...register('publication.publisher')}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          id={id('publication.place')}
          label={labels['publication.place']}
          labelSuffix="(optional)"
          error={errors.publication?.place?.message}
          {...register('publication.place')}
        />
        <TextField
          id={id('publication.edition')}
          label={labels['publication.edition']}
          labelSuffix="(optional)"
          hint="e.g. 2nd edition, enlarged"
          error={errors.publication?.edition?.message}
          {...register('publication.edition')}
        />
      </div>
    </FormSection>
  );
}
