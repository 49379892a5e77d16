import { useMemo } from 'react';
import { formatKey, keySignature, overviewForPiece, parseKey, validateA4, type SizeOverview } from '@shared/reckoner';
import { TextField } from '@/components/text-field';
import { apiUrl, musicWords, spokenSignature } from '../lib/format';
import { attempt, errorFor, type Outcome } from '../lib/outcome';
import type { ReckonerState, ReckonerUpdate } from '../lib/state';
import { PieceTable } from './piece-table';
import { PitchField } from './pitch-field';
import { ApiNote, LiveSummary, ReckonerSection } from './section';

export interface PieceReckoning {
  key: string;
  soundingSignature: number;
  rows: SizeOverview[];
  /** a′ the ranges were checked at, when a range was given and could be checked. */
  a4?: number;
}

/**
 * Fingering keys need only the key; the range check also needs both notes and a valid a′.
 * A bad note or a′ still leaves the fingering keys on screen, with the message by its field.
 */
function reckon(state: ReckonerState): { outcome?: Outcome<PieceReckoning>; rangeError?: Outcome<never> } {
  if (state.key.trim() === '') return {};
  const parsed = attempt(() => parseKey(state.key, 'key'), 'key');
  if (!parsed.ok) return { outcome: parsed };
  const base = { key: formatKey(parsed.value), soundingSignature: keySignature(parsed.value) };
  const lowest = state.lowest.trim();
  const highest = state.highest.trim();
  if (lowest && highest) {
    const ranged = attempt(() => {
      const a4 = validateA4(state.a, 'a');
      return { ...base, a4, rows: overviewForPiece({ key: base.key, lowest, highest, a4Hz: a4 }) };
    });
    if (ranged.ok) return { outcome: ranged };
    return { outcome: { ok: true, value: { ...base, rows: overviewForPiece({ key: base.key }) } }, rangeError: ranged };
  }
  return { outcome: { ok: true, value: { ...base, rows: overviewForPiece({ key: base.key }) } } };
}

function summary(result: PieceReckoning): string {
  const head = `${musicWords(result.key)}, ${spokenSignature(result.soundingSignature)}, on ${result.rows.length} sizes.`;
  if (result.a4 === undefined) return head;
  const fitting = result.rows.filter((row) => row.range?.fits).map((row) => row.name);
  return `${head} ${fitting.length === 0 ? 'No size fits the range.' : `Fits: ${fitting.join(', ')}.`}`;
}

export function PieceSection({ values, settled, update }: { values: ReckonerState; settled: ReckonerState; update: ReckonerUpdate }) {
  const { outcome, rangeError } = useMemo(() => reckon(settled), [settled]);
  const result = outcome?.ok ? outcome.value : undefined;
  const halfRange = (values.lowest.trim() === '') !== (values.highest.trim() === '');
  const apiSize = settled.size;

  return (
    <ReckonerSection
      id="piece"
      eyebrow="Fingering"
      title="Piece on every size"
      intro="The key a player’s fingers work in for a sounding key, on every size under C- and F-fingering, and whether the piece’s compass fits."
    >
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <TextField
          id="reckoner-key"
          label="Sounding key"
          value={values.key}
          onChange={(event) => update({ key: event.target.value })}
          placeholder="F major"
          hint="e.g. Eb major, E♭ major, B minor"
          error={errorFor(outcome, 'key')}
          autoComplete="off"
          spellCheck={false}
        />
        <TextField
          id="reckoner-lowest"
          label="Lowest note"
          labelSuffix="(optional)"
          value={values.lowest}
          onChange={(event) => update({ lowest: event.target.value })}
          placeholder="F4"
          hint={halfRange && values.lowest.trim() === '' ? 'Give the lowest note too to check the range.' : 'Sounding, modern pitch, e.g. F4'}
          error={errorFor(rangeError, 'lowest')}
          autoComplete="off"
          spellCheck={false}
          className="figures"
        />
        <TextField
          id="reckoner-highest"
          label="Highest note"
          labelSuffix="(optional)"
          value={values.highest}
          onChange={(event) => update({ highest: event.target.value })}
          placeholder="D6"
          hint={halfRange && values.highest.trim() === '' ? 'Give the highest note too to check the range.' : 'e.g. D6, C#6'}
          error={errorFor(rangeError, 'highest')}
          autoComplete="off"
          spellCheck={false}
          className="figures"
        />
        <PitchField
          id="reckoner-piece-a"
          label="a′ of the instruments (Hz)"
          value={values.a}
          hint="Shared with Sounding pitch."
          error={errorFor(rangeError, 'a')}
          onChange={(a, immediate) => update({ a }, { immediate })}
        />
      </div>

      <div className="mt-6">
        {result ? (
          <PieceTable result={result} />
        ) : (
          <p className="rounded-soft border border-dashed border-rule-strong px-4 py-6 text-center text-ink-muted">
            {outcome ? 'No table: see the message under the key.' : 'Enter a sounding key to see it on every size.'}
          </p>
        )}
      </div>
      <LiveSummary>{result ? summary(result) : outcome && !outcome.ok ? `Error: ${outcome.message}` : ''}</LiveSummary>
      <ApiNote
        urls={
          result
            ? (['C', 'F'] as const).map((fingering) => apiUrl('fingering', { size: apiSize, key: result.key, fingering }))
            : []
        }
      />
    </ReckonerSection>
  );
}
