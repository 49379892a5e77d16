import { useFieldArray, useFormContext } from 'react-hook-form';
import { creatorRoles, sourceTypeLabels, sourceTypes } from '@shared/catalogue/vocabulary';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { FormSection } from '@/features/contribute/components/form-section';
import { sourceFieldLabels as labels, sourceFormId, type SourceFormValues } from './values';

const id = (path: string) => fieldDomId(sourceFormId, path);
const roleLabel = (role: string) => role.charAt(0).toUpperCase() + role.slice(1);

export function IdentificationFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<SourceFormValues>();
  const creators = useFieldArray({ control, name: 'creators' });

  return (
    <FormSection title="Identification">
      <TextField
        id={id('title')}
        label={labels.title}
        hint="As the source gives it, in its own spelling; a descriptive title of your own goes in [square brackets]."
        error={errors.title?.message}
        className="font-serif text-lg"
        {...register('title')}
      />
      <Select id={id('sourceType')} label={labels.sourceType} error={errors.sourceType?.message} {...register('sourceType')}>
        <option value="">Choose…</option>
        {sourceTypes.map((type) => (
          <option key={type} value={type}>
            {sourceTypeLabels[type]}
          </option>
        ))}
      </Select>

      <div role="group" aria-labelledby={id('creators-heading')}>
        <p id={id('creators-heading')} className="text-sm font-medium text-ink">
          Creators
        </p>
        <p className="mt-1 text-sm text-ink-muted">Authors, compilers, scribes or makers, with names as the source gives them.</p>
        {creators.fields.length === 0 && <p className="mt-2 text-sm text-ink-muted">None recorded (anonymous or unknown).</p>}
        <ol className="mt-2 space-y-3">
          {creators.fields.map((field, index) => (
            <li key={field.id} className="flex flex-wrap items-end gap-3 rounded-soft border border-rule p-3">
              <TextField
                id={id(`creators.${index}.name`)}
                label={`Creator ${index + 1}: name`}
                containerClassName="min-w-[14rem] flex-1"
                error={errors.creators?.[index]?.name?.message}
                {...register(`creators.${index}.name`)}
              />
              <Select
                id={id(`creators.${index}.role`)}
                label={`Creator ${index + 1}: role`}
                containerClassName="w-40"
                error={errors.creators?.[index]?.role?.message}
                options={creatorRoles.map((role) => ({ value: role, label: roleLabel(role) }))}
                {...register(`creators.${index}.role`)}
              />
              <Button variant="quiet" size="sm" className="mb-1" onClick={() => creators.remove(index)}>
                Remove<span className="sr-only"> creator {index + 1}</span>
              </Button>
            </li>
          ))}
        </ol>
        {errors.creators?.message && <p className="mt-1 text-sm font-medium text-danger">{errors.creators.message}</p>}
        <Button variant="secondary" size="sm" className="mt-3" onClick={() => creators.append({ name: '', role: 'author' })}>
          Add a creator
        </Button>
      </div>
    </FormSection>
  );
}
