/**
 * The reckoner for a programme's pieces (client editor and server exports alike): the key the
 * player fingers on the chosen size and the range check at the piece's a′.
 */
import { fingeringKey, type FingeringResult } from '../reckoner/fingering';
import { checkRange, getSize, type RangeFit } from '../reckoner/sizes';
import { ReckonerError } from '../reckoner/errors';
import type { PieceFields } from './schema';

export interface PieceReckoning {
  sizeName: string;
  fingering: FingeringResult | null;
  range: RangeFit | null;
  /**
   * Three or more flats in the fingered key: on a baroque recorder such keys lie largely in
   * cross-fingerings (CP — common practice among players; no single published source).
   */
  crossFingered: boolean;
  error: string | null;
}

export const CROSS_FINGERED_FLATS = 3;

export function reckonPiece(piece: Pick<PieceFields, 'key' | 'sizeSlug' | 'aHz' | 'lowest' | 'highest' | 'fingering'>): PieceReckoning {
  try {
    const size = getSize(piece.sizeSlug);
    const fingering = fingeringKey(piece.sizeSlug, piece.key, piece.fingering);
    const range = piece.lowest && piece.highest ? checkRange(piece.sizeSlug, { lowest: piece.lowest, highest: piece.highest }, piece.aHz) : null;
    return { sizeName: size.name, fingering, range, crossFingered: fingering.keySignature <= -CROSS_FINGERED_FLATS, error: null };
  } catch (error) {
    return { sizeName: piece.sizeSlug, fingering: null, range: null, crossFingered: false, error: error instanceof ReckonerError ? error.message : String(error) };
  }
}

/** "3 flats", "2 sharps", "no sharps or flats". */
export function signatureText(count: number): string {
  if (count === 0) return 'no sharps or flats';
  const n = Math.abs(count);
  return `${n} ${count > 0 ? (n === 1 ? 'sharp' : 'sharps') : n === 1 ? 'flat' : 'flats'}`;
}

export function fingeringText(piece: Pick<PieceFields, 'fingering'>, r: PieceReckoning): string {
  if (!r.fingering) return r.error ?? '';
  const note = r.crossFingered ? ' — cross-fingered key' : '';
  return `${piece.fingering}-fingering: fingered in ${r.fingering.fingeringKey} (${signatureText(r.fingering.keySignature)})${note}`;
}

export function rangeText(r: PieceReckoning): string {
  if (!r.range) return r.error ? '' : 'range not given';
  const { fits, semitonesBelow, semitonesAbove, soundingRange } = r.range;
  const span = `${soundingRange.lowest}–${soundingRange.highest}`;
  if (fits) return `fits (instrument sounds ${span})`;
  const misses = [semitonesBelow ? `${semitonesBelow} semitone${semitonesBelow > 1 ? 's' : ''} below` : '', semitonesAbove ? `${semitonesAbove} semitone${semitonesAbove > 1 ? 's' : ''} above` : '']
    .filter(Boolean)
    .join(' and ');
  return `does not fit: ${misses} the range (instrument sounds ${span})`;
}
