import { useFormContext } from 'react-hook-form';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { sourceFieldLabels as labels, sourceFormId, type SourceFormValues } from './values';

const id = (path: string) => fieldDomId(sourceFormId, path);

export function HoldingFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<SourceFormValues>();
  return (
    <FormSection title="Holding" description="Where the original can be consulted, so others can find and cite it.">
      <TextField
        id={id('holdingInstitution')}
        label={labels.holdingInstitution}
        labelSuffix="(optional)"
        hint="Library, archive or collection."
        error={errors.holdingInstitution?.message}
        {...register('holdingInstitution')}
      />
      <TextField
        id={id('shelfmark')}
        label={labels.shelfmark}
        labelSuffix="(optional)"
        error={errors.shelfmark?.message}
        className="max-w-md"
        {...register('shelfmark')}
      />
      <TextField
        id={id('externalUrl')}
        type="url"
        inputMode="url"
        label={labels.externalUrl}
        labelSuffix="(optional)"
        hint="A full address beginning with https://"
        error={errors.externalUrl?.message}
        {...register('externalUrl')}
      />
    </FormSection>
  );
}
