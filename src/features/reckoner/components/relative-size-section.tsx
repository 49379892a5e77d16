import { useMemo } from 'react';
import { intervalBetweenSizes, resolveSizeDescription } from '@shared/reckoner';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { musicWords, plural } from '../lib/format';
import { attempt, errorFor } from '../lib/outcome';
import type { ReckonerState, ReckonerUpdate } from '../lib/state';
import { MusicText } from './music-text';
import { LiveSummary, ReckonerSection, Readings } from './section';

const EXAMPLES = ['a tone and a half below the treble', 'a fourth below the alto', 'a tone above the tenor'];

function reckon(desc: string) {
  if (desc.trim() === '') return undefined;
  return attempt(() => {
    const resolved = resolveSizeDescription(desc, 'desc');
    const interval = intervalBetweenSizes(resolved.reference.slug, resolved.size.slug);
    return { ...resolved, interval };
  }, 'desc');
}

export function RelativeSizeSection({ values, settled, update }: { values: ReckonerState; settled: ReckonerState; update: ReckonerUpdate }) {
  const outcome = useMemo(() => reckon(settled.desc), [settled.desc]);
  const result = outcome?.ok ? outcome.value : undefined;
  const direction = result && result.semitones < 0 ? 'below' : 'above';

  return (
    <ReckonerSection
      id="relative-size"
      eyebrow="Sizes"
      title="Relative size"
      intro="Sources often name a size by its distance from another. Write the description as the source does."
    >
      <TextField
        id="reckoner-desc"
        label="Description"
        value={values.desc}
        onChange={(event) => update({ desc: event.target.value })}
        placeholder="a fourth below the alto"
        hint="An interval, a direction and a size, e.g. “a tone above the tenor”."
        error={errorFor(outcome, 'desc')}
        autoComplete="off"
        spellCheck={false}
      />
      <div className="mt-3 flex flex-wrap items-center gap-x-2 gap-y-1 text-sm">
        <span className="text-ink-muted" id="relative-examples">
          Examples:
        </span>
        <ul aria-labelledby="relative-examples" className="flex flex-wrap gap-1">
          {EXAMPLES.map((example) => (
            <li key={example}>
              <Button variant="quiet" size="sm" onClick={() => update({ desc: example }, { immediate: true })}>
                <span className="font-serif italic">{example}</span>
              </Button>
            </li>
          ))}
        </ul>
      </div>

      <div className="mt-6 rounded-soft border border-rule bg-paper px-4 py-4">
        {result ? (
          <>
            <Readings
              items={[
                {
                  term: 'Size',
                  detail: (
                    <>
                      <span className="font-serif text-xl">{result.size.name}</span>{' '}
                      <span className="text-ink-muted">
                        (lowest <MusicText>{result.size.nominalLowest}</MusicText>)
                      </span>
                    </>
                  ),
                },
                {
                  term: 'Interval',
                  detail: `${result.interval.name} ${direction}`,
                  note: (
                    <>
                      {plural(Math.abs(result.semitones), 'semitone')} from the {result.reference.name.toLowerCase()} (
                      <MusicText>{result.reference.nominalLowest}</MusicText>)
                    </>
                  ),
                },
              ]}
            />
            {result.size.slug !== values.size && (
              <Button
                className="mt-4"
                variant="secondary"
                size="sm"
                onClick={() => {
                  update({ size: result.size.slug }, { immediate: true });
                  document.getElementById('reckoner-size')?.focus();
                }}
              >
                Reckon the {result.size.name.toLowerCase()}’s sounding pitch
              </Button>
            )}
          </>
        ) : (
          <p className="text-ink-muted">
            {outcome ? 'No size found: see the message under the description.' : 'The size appears here as you type.'}
          </p>
        )}
      </div>
      <LiveSummary>
        {result
          ? `${result.size.name}, lowest ${musicWords(result.size.nominalLowest)}: a ${result.interval.name} ${direction} the ${result.reference.name.toLowerCase()}.`
          : outcome && !outcome.ok
            ? `Error: ${outcome.message}`
            : ''}
      </LiveSummary>
    </ReckonerSection>
  );
}
