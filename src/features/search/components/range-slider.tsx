import { useEffect, useId, useState } from 'react';
import { cn } from '@/lib/cn';

export interface RangeSliderProps {
  label: string;
  min: number;
  max: number;
  step?: number;
  /** Current bounds; undefined = open at that end. */
  low?: number;
  high?: number;
  onCommit: (low: number | undefined, high: number | undefined) => void;
  /** Labelled ticks under the track, e.g. the usual a′ standards. */
  marks?: readonly number[];
  format?: (value: number) => string;
  /** Names of the two handles for assistive technology. */
  lowLabel: string;
  highLabel: string;
}

const thumb =
  '[&::-webkit-slider-thumb]:pointer-events-auto [&::-webkit-slider-thumb]:appearance-none [&::-webkit-slider-thumb]:size-5 ' +
  '[&::-webkit-slider-thumb]:rounded-full [&::-webkit-slider-thumb]:border-2 [&::-webkit-slider-thumb]:border-accent-strong ' +
  '[&::-webkit-slider-thumb]:bg-paper-raised [&::-webkit-slider-thumb]:cursor-pointer ' +
  '[&::-moz-range-thumb]:pointer-events-auto [&::-moz-range-thumb]:size-4 [&::-moz-range-thumb]:rounded-full ' +
  '[&::-moz-range-thumb]:border-2 [&::-moz-range-thumb]:border-accent-strong [&::-moz-range-thumb]:bg-paper-raised';

/**
 * Two native range inputs on one track: each handle is a real slider (arrow keys,
 * Page Up/Down, Home/End), named for screen readers; the range is committed after
 * the handles rest for a moment, so dragging does not flood the history.
 */
export function RangeSlider({ label, min, max, step = 1, low, high, onCommit, marks = [], format = String, lowLabel, highLabel }: RangeSliderProps) {
  const id = useId();
  const [lo, setLo] = useState(low ?? min);
  const [hi, setHi] = useState(high ?? max);
  useEffect(() => setLo(low ?? min), [low, min]);
  useEffect(() => setHi(high ?? max), [high, max]);

  useEffect(() => {
    const nextLow = lo <= min ? undefined : lo;
    const nextHigh = hi >= max ? undefined : hi;
    if (nextLow === low && nextHigh === high) return;
    const timer = setTimeout(() => onCommit(nextLow, nextHigh), 300);
    return () => clearTimeout(timer);
  }, [lo, hi, low, high, min, max, onCommit]);

  const pct = (v: number) => ((v - min) / (max - min)) * 100;
  const open = lo <= min && hi >= max;
  const input = cn('pointer-events-none absolute inset-x-0 top-1 h-6 w-full appearance-none bg-transparent', thumb);

  return (
    <fieldset className="min-w-0">
      <legend className="text-sm font-semibold text-ink">{label}</legend>
      <p id={`${id}-value`} className="figures mt-1 text-sm text-ink-muted" aria-live="polite">
        {open ? 'Any' : `${format(lo)} – ${format(hi)}`}
      </p>
      <div className="relative mt-2 h-8">
        <div className="absolute inset-x-0 top-3.5 h-1 rounded bg-rule" aria-hidden="true" />
        <div className="absolute top-3.5 h-1 rounded bg-accent" style={{ left: `${pct(lo)}%`, width: `${pct(hi) - pct(lo)}%` }} aria-hidden="true" />
        <input
          type="range" min={min} max={max} step={step} value={lo} aria-label={lowLabel} aria-valuetext={format(lo)}
          aria-describedby={`${id}-value`} className={input}
          onChange={(e) => setLo(Math.min(Number(e.target.value), hi))}
        />
        <input
          type="range" min={min} max={max} step={step} value={hi} aria-label={highLabel} aria-valuetext={format(hi)}
          aria-describedby={`${id}-value`} className={input}
          onChange={(e) => setHi(Math.max(Number(e.target.value), lo))}
        />
      </div>
      <div className="figures relative mt-1 h-5 text-xs text-ink-muted" aria-hidden="true">
        {[min, ...marks, max].map((m) => (
          <span key={m} className="absolute -translate-x-1/2" style={{ left: `${pct(m)}%` }}>
            <span className="mx-auto block h-1.5 w-px bg-rule-strong" />
            {m}
          </span>
        ))}
      </div>
      {marks.length > 0 && (
        <div className="mt-3 flex flex-wrap gap-1.5">
          {marks.map((m) => (
            <button
              key={m} type="button"
              className="figures rounded-soft border border-rule px-1.5 py-0.5 text-xs text-ink-muted hover:border-rule-strong hover:text-ink"
              onClick={() => { setLo(Math.max(min, m - 6)); setHi(Math.min(max, m + 6)); }}
            >
              near {format(m)}
            </button>
          ))}
        </div>
      )}
      {!open && (
        <button type="button" className="mt-2 text-sm text-accent-strong underline" onClick={() => { setLo(min); setHi(max); }}>
          Any {label.toLowerCase()}
        </button>
      )}
    </fieldset>
  );
}
