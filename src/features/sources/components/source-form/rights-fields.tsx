import { useFormContext } from 'react-hook-form';
import { facsimileAccessLevels, type FacsimileAccess } from '@shared/catalogue/vocabulary';
import { Select } from '@/components/select';
import { FormSection } from '@/features/contribute/components/form-section';
import { TextareaField } from '@/components/textarea-field';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { sourceFieldLabels as labels, sourceFormId, type SourceFormValues } from './values';

const id = (path: string) => fieldDomId(sourceFormId, path);

export const facsimileAccessLabels: Record<FacsimileAccess, string> = {
  public: 'Anyone',
  'signed-in': 'Signed-in users only',
  hidden: 'Nobody but editors (text only)',
};

export function RightsFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<SourceFormValues>();
  return (
    <FormSection title="Rights" description="Facsimiles may be under copyright or library terms. Say what applies; editors will check it.">
      <TextareaField
        id={id('rightsStatement')}
        label={labels.rightsStatement}
        labelSuffix="(optional)"
        hint="e.g. “Reproduced by permission of the holding library; not for further reproduction.”"
        rows={3}
        error={errors.rightsStatement?.message}
        {...register('rightsStatement')}
      />
      <Select
        id={id('facsimileAccess')}
        label={labels.facsimileAccess}
        error={errors.facsimileAccess?.message}
        options={facsimileAccessLevels.map((level) => ({ value: level, label: facsimileAccessLabels[level] }))}
        containerClassName="max-w-md"
        {...register('facsimileAccess')}
      />
    </FormSection>
  );
}
