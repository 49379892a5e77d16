import { useFormContext, useWatch } from 'react-hook-form';
import { isValidLocator, locatorExamples, formatLocator } from '@shared/catalogue/locator';
import { locatorTypes, type LocatorType } from '@shared/catalogue/vocabulary';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { excerptFieldLabels as labels, excerptFormId, toNumber, type ExcerptFormValues } from './values';

const id = (path: string) => fieldDomId(excerptFormId, path);
const typeLabel = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);

export interface LocatorFieldsProps {
  /** The page open in the facsimile viewer, if any. */
  currentPage: number | null;
}

export function LocatorFields({ currentPage }: LocatorFieldsProps) {
  const {
    register,
    control,
    setValue,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  const [type, value] = useWatch({ control, name: ['locatorType', 'locatorValue'] });
  const locatorType = (locatorTypes as readonly string[]).includes(type ?? '') ? (type as LocatorType) : 'page';
  const preview = value?.trim() && isValidLocator(locatorType, value) ? formatLocator(locatorType, value.trim()) : null;

  return (
    <FormSection title="Where in the source" description="The locator is what a citation prints: a page, folio, signature, column or plate.">
      <div className="grid gap-3 sm:grid-cols-[12rem_1fr]">
        <Select
          id={id('locatorType')}
          label={labels.locatorType}
          error={errors.locatorType?.message}
          options={locatorTypes.map((t) => ({ value: t, label: typeLabel(t) }))}
          {...register('locatorType')}
        />
        <div>
          <TextField
            id={id('locatorValue')}
            label={labels.locatorValue}
            hint={`e.g. ${locatorExamples[locatorType]}; a range joins two with a dash.`}
            error={errors.locatorValue?.message}
            className="figures"
            autoComplete="off"
            spellCheck={false}
            {...register('locatorValue')}
          />
          <p className="mt-1 min-h-5 text-sm text-ink-muted" aria-live="polite">
            {preview && (
              <>
                Cited as <span className="figures text-ink">{preview}</span>
              </>
            )}
          </p>
        </div>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          id={id('facsimilePage')}
          label={labels.facsimilePage}
          labelSuffix="(optional)"
          hint="The page of the uploaded file, which may differ from the printed page number."
          inputMode="numeric"
          error={errors.facsimilePage?.message}
          className="figures max-w-28"
          containerClassName="flex-1"
          {...register('facsimilePage', { setValueAs: toNumber(null) })}
        />
        <Button
          variant="secondary"
          size="sm"
          className="mb-1.5"
          disabled={currentPage === null}
          onClick={() => currentPage !== null && setValue('facsimilePage', currentPage, { shouldDirty: true, shouldValidate: true })}
        >
          Use current page{currentPage !== null ? ` (${currentPage})` : ''}
        </Button>
      </div>
    </FormSection>
  );
}
