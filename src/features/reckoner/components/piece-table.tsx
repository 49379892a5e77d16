import { useId } from 'react';
import type { FingeringResult, RangeFit, SizeOverview } from '@shared/reckoner';
import { cn } from '@/lib/cn';
import { plural } from '../lib/format';
import { KeySignature, MusicText } from './music-text';
import type { PieceReckoning } from './piece-section';

/** Fingering keys with this many flats or more lie in cross-fingerings on a baroque recorder. */
export const CROSS_FINGERED_FLATS = 4;

function FingeredKey({ result }: { result: FingeringResult }) {
  const crossFingered = result.keySignature <= -CROSS_FINGERED_FLATS;
  return (
    <div>
      <span className="font-medium">
        <MusicText>{result.fingeringKey}</MusicText>
      </span>{' '}
      <span className="text-ink-muted">
        (<KeySignature count={result.keySignature} />)
      </span>
      {crossFingered && (
        <span className="label-caps ml-2 inline-flex items-center whitespace-nowrap gap-1 rounded-soft border border-caution px-1.5 py-px text-[0.6875rem] text-caution">
          <span aria-hidden="true">⨯</span>cross-fingered
        </span>
      )}
    </div>
  );
}

function RangeCell({ range }: { range: RangeFit }) {
  const span = (
    <span className="block text-sm text-ink-muted">
      compass <MusicText>{range.soundingRange.lowest}</MusicText>–<MusicText>{range.soundingRange.highest}</MusicText>
    </span>
  );
  if (range.fits) {
    return (
      <div>
        <span className="inline-flex items-center gap-1 font-semibold text-accent-strong">
          <span aria-hidden="true">✓</span> fits
        </span>
        {span}
      </div>
    );
  }
  const misses = [
    range.semitonesBelow > 0 ? `${plural(range.semitonesBelow, 'semitone')} too low` : '',
    range.semitonesAbove > 0 ? `${plural(range.semitonesAbove, 'semitone')} too high` : '',
  ].filter(Boolean);
  return (
    <div>
      <span className="figures">{misses.join(', ')}</span>
      {span}
    </div>
  );
}

function Row({ row, ranged }: { row: SizeOverview; ranged: boolean }) {
  const fits = row.range?.fits ?? false;
  return (
    <tr data-size={row.slug} className={cn('border-t border-rule align-top', fits && 'bg-accent-soft/70')}>
      <th scope="row" className={cn('py-2.5 pr-4 pl-3 text-left font-normal', fits ? 'border-l-4 border-accent' : 'border-l-4 border-transparent')}>
        <span className="font-medium text-ink">{row.name}</span>
        <span className="block text-sm text-ink-muted">
          lowest <MusicText>{row.nominalLowest}</MusicText>
        </span>
      </th>
      <td className="py-2.5 pr-4">
        <FingeredKey result={row.cFingering} />
      </td>
      <td className="py-2.5 pr-4">
        <FingeredKey result={row.fFingering} />
      </td>
      {ranged && <td className="py-2.5 pr-3">{row.range && <RangeCell range={row.range} />}</td>}
    </tr>
  );
}

export function PieceTable({ result }: { result: PieceReckoning }) {
  const captionId = useId();
  const ranged = result.a4 !== undefined;
  const fitting = result.rows.filter((row) => row.range?.fits).length;
  return (
    <div className="overflow-x-auto rounded-soft border border-rule bg-paper" tabIndex={0} role="group" aria-labelledby={captionId}>
      <table className="w-full min-w-[36rem] border-collapse text-[0.9375rem]">
        <caption id={captionId} className="px-3 py-2 text-left text-sm text-ink-muted">
          <span className="font-medium text-ink">
            <MusicText>{result.key}</MusicText>
          </span>{' '}
          (<KeySignature count={result.soundingSignature} />) sounding, on every size
          {ranged
            ? `, range checked at a′ = ${result.a4} Hz: ${fitting === 0 ? 'no size fits' : `${plural(fitting, 'size')} fit${fitting === 1 ? 's' : ''}`}.`
            : '. Give the lowest and highest notes to check the range.'}
        </caption>
        <thead>
          <tr className="label-caps text-left text-ink-muted">
            <th scope="col" className="py-2 pr-4 pl-4 font-semibold">Size</th>
            <th scope="col" className="py-2 pr-4 font-semibold">C-fingering</th>
            <th scope="col" className="py-2 pr-4 font-semibold">F-fingering</th>
            {ranged && <th scope="col" className="py-2 pr-3 font-semibold">Range</th>}
          </tr>
        </thead>
        <tbody className="figures">
          {result.rows.map((row) => (
            <Row key={row.slug} row={row} ranged={ranged} />
          ))}
        </tbody>
      </table>
      <p className="border-t border-rule px-3 py-2 text-sm text-ink-muted">
        Key signatures are counts of sharps (♯) or flats (♭). Fingering keys with {CROSS_FINGERED_FLATS} or more flats are
        marked <span className="label-caps">cross-fingered</span>.
      </p>
    </div>
  );
}
