import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { fingeringText, rangeText, reckonPiece, signatureText } from '@shared/programmes/pieces';
import type { PieceInput } from '@shared/programmes/schema';
import { Button } from '@/components/button';
import { cn } from '@/lib/cn';

const blank: PieceInput = { title: '', composer: '', key: 'F major', sizeSlug: 'alto', aHz: 415, lowest: '', highest: '', fingering: 'F' };

export interface PiecesTableProps {
  pieces: PieceInput[];
  onChange?: (pieces: PieceInput[]) => void;
  readOnly?: boolean;
}

/**
 * The programme's pieces with the reckoner's verdict per piece: the fingered key under C- or
 * F-fingering with its signature (three or more flats marked as a cross-fingered key, by text and
 * weight, not by colour alone) and the range check at the piece's a′.
 */
export function PiecesTable({ pieces, onChange, readOnly = false }: PiecesTableProps) {
  const set = (i: number, patch: Partial<PieceInput>) => onChange?.(pieces.map((p, j) => (j === i ? { ...p, ...patch } : p)));
  const input = 'field-control w-full min-w-0 px-2 py-1 text-sm';
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm [font-variant-numeric:tabular-nums]">
        <thead>
          <tr className="border-b border-rule-strong text-left">
            <th className="p-2">Piece</th><th className="p-2">Composer</th><th className="p-2">Sounding key</th><th className="p-2">Size</th>
            <th className="p-2">a′ (Hz)</th><th className="p-2">Lowest–highest</th><th className="p-2">Fingering</th><th className="p-2">Reckoner</th>
            {!readOnly && <th className="p-2"><span className="sr-only">Remove</span></th>}
          </tr>
        </thead>
        <tbody>
          {pieces.map((piece, i) => {
            const complete = { ...piece, aHz: piece.aHz ?? 415, fingering: piece.fingering ?? 'F', lowest: piece.lowest || null, highest: piece.highest || null };
            const r = reckonPiece(complete);
            return (
              <tr key={i} className="border-b border-rule align-top">
                {readOnly ? (
                  <>
                    <td className="p-2 font-serif">{piece.title}</td><td className="p-2">{piece.composer}</td><td className="p-2">{piece.key}</td>
                    <td className="p-2">{r.sizeName}</td><td className="p-2">{complete.aHz}</td>
                    <td className="p-2">{piece.lowest && piece.highest ? `${piece.lowest}–${piece.highest}` : '—'}</td><td className="p-2">{complete.fingering}</td>
                  </>
                ) : (
                  <>
                    <td className="p-1"><input aria-label={`Title of piece ${i + 1}`} className={input} value={piece.title} onChange={(e) => set(i, { title: e.target.value })} /></td>
                    <td className="p-1"><input aria-label={`Composer of piece ${i + 1}`} className={input} value={piece.composer ?? ''} onChange={(e) => set(i, { composer: e.target.value })} /></td>
                    <td className="p-1"><input aria-label={`Sounding key of piece ${i + 1}`} className={input} value={piece.key} onChange={(e) => set(i, { key: e.target.value })} /></td>
                    <td className="p-1">
                      <select aria-label={`Size for piece ${i + 1}`} className={input} value={piece.sizeSlug} onChange={(e) => set(i, { sizeSlug: e.target.value })}>
                        {INSTRUMENT_SIZES.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
                      </select>
                    </td>
                    <td className="p-1"><input aria-label={`a′ for piece ${i + 1}`} type="number" min={350} max={500} step={0.5} className={cn(input, 'w-20')} value={complete.aHz} onChange={(e) => set(i, { aHz: Number(e.target.value) })} /></td>
                    <td className="p-1">
                      <div className="flex gap-1">
                        <input aria-label={`Lowest sounding note of piece ${i + 1}`} placeholder="F4" className={cn(input, 'w-16')} value={piece.lowest ?? ''} onChange={(e) => set(i, { lowest: e.target.value })} />
                        <input aria-label={`Highest sounding note of piece ${i + 1}`} placeholder="G6" className={cn(input, 'w-16')} value={piece.highest ?? ''} onChange={(e) => set(i, { highest: e.target.value })} />
                      </div>
                    </td>
                    <td className="p-1">
                      <select aria-label={`Fingering for piece ${i + 1}`} className={input} value={complete.fingering} onChange={(e) => set(i, { fingering: e.target.value as 'C' | 'F' })}>
                        <option value="F">F</option><option value="C">C</option>
                      </select>
                    </td>
                  </>
                )}
                <td className="p-2 text-[0.8125rem]">
                  {r.error ? <span className="text-danger">{r.error}</span> : (
                    <>
                      <p className={cn(r.crossFingered && 'font-semibold text-caution')}>
                        {r.crossFingered && <span aria-hidden="true">⚠ </span>}
                        {fingeringText(complete, r)}
                      </p>
                      {r.fingering && <p className="text-ink-muted">Sounding key: {signatureText(r.fingering.soundingKeySignature)}</p>}
                      <p className={cn(r.range && !r.range.fits && 'italic text-danger')}>{rangeText(r)}</p>
                    </>
                  )}
                </td>
                {!readOnly && (
                  <td className="p-1"><Button variant="quiet" size="sm" onClick={() => onChange?.(pieces.filter((_, j) => j !== i))} aria-label={`Remove piece ${i + 1}`}>Remove</Button></td>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
      {!readOnly && <Button className="mt-2" variant="secondary" size="sm" onClick={() => onChange?.([...pieces, { ...blank }])}>Add a piece</Button>}
    </div>
  );
}
