import { useMemo } from 'react';
import { INSTRUMENT_SIZES, getSize, nearestPitchStandard, reckonSounding, validateA4 } from '@shared/reckoner';
import { Select } from '@/components/select';
import { apiUrl, formatCents, formatHz, musicGlyphs, musicWords, spokenCents } from '../lib/format';
import { attempt, errorFor } from '../lib/outcome';
import type { ReckonerState, ReckonerUpdate } from '../lib/state';
import { MusicText } from './music-text';
import { PitchField } from './pitch-field';
import { ApiNote, LiveSummary, ReckonerSection, Readings } from './section';

const sizeOptions = INSTRUMENT_SIZES.map((size) => ({
  value: size.slug,
  label: `${size.name} — lowest ${musicGlyphs(size.nominalLowest)}`,
}));

function reckon(state: ReckonerState) {
  return attempt(() => {
    const a4 = validateA4(state.a, 'a');
    const size = getSize(state.size);
    return { a4, size, sounding: reckonSounding(size.slug, a4), standard: nearestPitchStandard(a4) };
  });
}

export function SoundingSection({ values, settled, update }: { values: ReckonerState; settled: ReckonerState; update: ReckonerUpdate }) {
  const outcome = useMemo(() => reckon(settled), [settled]);
  const result = outcome.ok ? outcome.value : undefined;

  return (
    <ReckonerSection
      id="sounding"
      eyebrow="Pitch"
      title="Sounding pitch"
      intro="Where a size’s lowest note sounds when the instrument is built to a given a′, described at modern pitch (a′ = 440 Hz)."
    >
      <div className="space-y-5">
        <Select
          id="reckoner-size"
          label="Size"
          value={values.size}
          options={sizeOptions}
          onChange={(event) => update({ size: event.target.value }, { immediate: true })}
          error={errorFor(outcome, 'size')}
        />
        <PitchField
          id="reckoner-a"
          label="a′ (Hz)"
          value={values.a}
          quickPicks
          error={errorFor(outcome, 'a')}
          onChange={(a, immediate) => update({ a }, { immediate })}
        />
      </div>

      <div className="mt-6 rounded-soft border border-rule bg-paper px-4 py-4">
        {result ? (
          <Readings
            items={[
              {
                term: 'Nominal lowest note',
                detail: <MusicText>{result.sounding.nominal}</MusicText>,
                note: result.size.writtenOctaveOffset > 0 ? 'Parts are written an octave below this.' : undefined,
              },
              { term: 'Frequency', detail: `${formatHz(result.sounding.frequencyHz)} Hz`, note: `at a′ = ${result.a4} Hz` },
              {
                term: 'At modern pitch',
                detail: (
                  <>
                    <MusicText>{result.sounding.nearest.note}</MusicText> {formatCents(result.sounding.nearest.cents)} cents
                  </>
                ),
                note: 'Nearest equal-tempered note at a′ = 440 Hz, and how far from it.',
              },
              {
                term: 'Pitch of the instrument',
                detail: `${formatCents(result.sounding.centsFromModern)} cents`,
                note: `from a′ = 440 Hz; nearest named standard: ${result.standard.shortName} (${result.standard.hz} Hz, ${formatCents(result.standard.cents)} cents)`,
              },
            ]}
          />
        ) : (
          <p className="text-ink-muted">Choose a size and an a′ between 350 and 500 Hz to see where it sounds.</p>
        )}
      </div>
      <LiveSummary>
        {result
          ? `${result.size.name} at a′ = ${result.a4} Hz: lowest note ${musicWords(result.sounding.nominal)} sounds at ${formatHz(result.sounding.frequencyHz)} hertz, ${musicWords(result.sounding.nearest.note)} at modern pitch, ${spokenCents(result.sounding.nearest.cents)}.`
          : !outcome.ok
            ? `Error: ${outcome.message}`
            : ''}
      </LiveSummary>
      <ApiNote urls={result ? [apiUrl('sounding', { size: result.size.slug, a: String(result.a4) })] : []} />
    </ReckonerSection>
  );
}
