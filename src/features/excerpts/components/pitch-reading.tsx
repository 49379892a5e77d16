import { centsFromModern, nearestPitchStandard, ReckonerError, roundTo, validateA4 } from '@shared/reckoner';

export type PitchReadingResult =
  | { ok: true; hz: number; cents: number; standard: { name: string; hz: number; cents: number } }
  | { ok: false; message: string };

/** Signed figure with a true minus sign: "−101.3", "+25.0". */
export function signed(value: number, decimals = 1): string {
  const rounded = roundTo(value, decimals);
  const text = Math.abs(rounded).toFixed(decimals);
  return rounded < 0 ? `−${text}` : rounded > 0 ? `+${text}` : text;
}

/** Cents from a′ = 440 and the nearest named standard, or why the value is not an a′. */
export function readPitch(value: unknown): PitchReadingResult | null {
  if (value === null || value === undefined || (typeof value === 'string' && value.trim() === '')) return null;
  if (typeof value === 'number' && Number.isNaN(value)) return null;
  try {
    const hz = validateA4(typeof value === 'string' ? value.replace(',', '.') : value, 'aHz');
    const standard = nearestPitchStandard(hz);
    return { ok: true, hz, cents: centsFromModern(hz), standard: { name: standard.shortName, hz: standard.hz, cents: standard.cents } };
  } catch (error) {
    return { ok: false, message: error instanceof ReckonerError ? error.message : 'Not a frequency.' };
  }
}

/** The live reading under an a′ input. */
export function PitchReading({ value, id }: { value: unknown; id: string }) {
  const reading = readPitch(value);
  return (
    <p id={id} aria-live="polite" className="mt-1 min-h-6 text-sm">
      {reading === null ? (
        <span className="text-ink-muted">Type a′ in hertz, e.g. 415, to see it in cents.</span>
      ) : reading.ok ? (
        <>
          <span className="figures font-medium">{signed(reading.cents)} cents</span> from a′ = 440 Hz · nearest standard:{' '}
          <span className="font-medium">{reading.standard.name}</span>{' '}
          <span className="figures text-ink-muted">
            (a′ = {reading.standard.hz} Hz{Math.abs(reading.standard.cents) >= 0.05 ? `, ${signed(reading.standard.cents)} cents` : ''})
          </span>
        </>
      ) : (
        <span className="text-ink-muted">{reading.message}</span>
      )}
    </p>
  );
}
