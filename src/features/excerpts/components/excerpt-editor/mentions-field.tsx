import { useFieldArray, useFormContext } from 'react-hook-form';
import { limits } from '@shared/catalogue/schemas';
import { certainties } from '@shared/catalogue/vocabulary';
import { INSTRUMENT_SIZES } from '@shared/reckoner';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { FormSection } from '@/features/contribute/components/form-section';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { useSizes } from '../../api/get-sizes';
import { RelativeSizeInput } from '../relative-size-input';
import { emptyToNull, excerptFormId, type ExcerptFormValues } from './values';

const id = (path: string) => fieldDomId(excerptFormId, path);

const certaintyLabels = { certain: 'Certain', probable: 'Probable', conjectural: 'Conjectural' } as const;

/** Sizes from the vocabulary API, or the shared seed list until it answers. */
function useSizeOptions() {
  const sizes = useSizes();
  const list = sizes.data?.data.length
    ? [...sizes.data.data].sort((a, b) => a.sortOrder - b.sortOrder).map((s) => ({ slug: s.slug, name: s.name, family: s.family, note: s.nominalNote }))
    : INSTRUMENT_SIZES.map((s) => ({ slug: s.slug, name: s.name, family: s.family, note: s.nominalLowest }));
  const families = [...new Set(list.map((s) => s.family))];
  return { list, families };
}

export function MentionsField({ defaultLanguage }: { defaultLanguage: string }) {
  const {
    register,
    control,
    setValue,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  const mentions = useFieldArray({ control, name: 'mentions' });
  const { list, families } = useSizeOptions();

  return (
    <FormSection
      title="Instrument mentions"
      description="Each term the passage uses for an instrument, as written, and the size it denotes. These build the concordance of historical terms."
    >
      {mentions.fields.length === 0 && <p className="text-sm text-ink-muted">No instrument named yet.</p>}
      <ol className="space-y-4">
        {mentions.fields.map((field, index) => {
          const e = errors.mentions?.[index];
          const n = index + 1;
          return (
            <li key={field.id} className="space-y-3 rounded-soft border border-rule p-3">
              <div className="grid gap-3 sm:grid-cols-[2fr_1fr]">
                <TextField
                  id={id(`mentions.${index}.term`)}
                  label={`Mention ${n}: term as written`}
                  className="font-serif text-lg"
                  error={e?.term?.message}
                  {...register(`mentions.${index}.term`)}
                />
                <TextField
                  id={id(`mentions.${index}.language`)}
                  label={`Mention ${n}: language`}
                  hint="BCP 47, e.g. fr"
                  spellCheck={false}
                  error={e?.language?.message}
                  {...register(`mentions.${index}.language`)}
                />
              </div>
              <div className="grid gap-3 sm:grid-cols-2">
                <Select id={id(`mentions.${index}.sizeSlug`)} label={`Mention ${n}: size`} error={e?.sizeSlug?.message} {...register(`mentions.${index}.sizeSlug`)}>
                  <option value="">Choose a size…</option>
                  {families.map((family) => (
                    <optgroup key={family} label={family.charAt(0).toUpperCase() + family.slice(1)}>
                      {list
                        .filter((s) => s.family === family)
                        .map((s) => (
                          <option key={s.slug} value={s.slug}>
                            {s.name} (lowest {s.note})
                          </option>
                        ))}
                    </optgroup>
                  ))}
                </Select>
                <Select
                  id={id(`mentions.${index}.certainty`)}
                  label={`Mention ${n}: certainty`}
                  error={e?.certainty?.message}
                  options={certainties.map((c) => ({ value: c, label: certaintyLabels[c] }))}
                  {...register(`mentions.${index}.certainty`)}
                />
              </div>
              <RelativeSizeInput
                context={`mention ${n}`}
                onUse={(slug) => {
                  setValue(`mentions.${index}.sizeSlug`, slug, { shouldDirty: true, shouldValidate: true });
                  document.getElementById(id(`mentions.${index}.sizeSlug`))?.focus();
                }}
              />
              <TextField
                id={id(`mentions.${index}.note`)}
                label={`Mention ${n}: note`}
                labelSuffix="(optional)"
                error={e?.note?.message}
                {...register(`mentions.${index}.note`, { setValueAs: emptyToNull })}
              />
              <Button variant="quiet" size="sm" onClick={() => mentions.remove(index)}>
                Remove mention {n}
              </Button>
            </li>
          );
        })}
      </ol>
      <Button
        variant="secondary"
        size="sm"
        disabled={mentions.fields.length >= limits.mentions}
        onClick={() => mentions.append({ term: '', language: defaultLanguage, sizeSlug: '', certainty: 'probable', note: '' })}
      >
        Add an instrument mention
      </Button>
    </FormSection>
  );
}
