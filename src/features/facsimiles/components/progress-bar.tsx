import { cn } from '@/lib/cn';

export interface ProgressBarProps {
  label: string;
  /** 0–100; null while the amount is not known yet. */
  value: number | null;
  /** Spoken and shown instead of the percentage, e.g. "12 of 40 pages". */
  valueText?: string;
  className?: string;
}

/** A labelled progress bar with the ARIA values assistive technology reads out. */
export function ProgressBar({ label, value, valueText, className }: ProgressBarProps) {
  const clamped = value === null ? null : Math.max(0, Math.min(100, Math.round(value)));
  const text = valueText ?? (clamped === null ? 'Starting…' : `${clamped} %`);
  return (
    <div className={className}>
      <div className="flex justify-between gap-3 text-sm">
        <span className="font-medium text-ink">{label}</span>
        <span className="figures text-ink-muted" aria-hidden="true">
          {text}
        </span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={clamped ?? undefined}
        aria-valuetext={text}
        className="mt-1 h-2 overflow-hidden rounded-full border border-rule-strong bg-paper-sunk"
      >
        <div
          className={cn('h-full bg-accent transition-[width] duration-300', clamped === null && 'w-1/4 animate-pulse')}
          style={clamped === null ? undefined : { width: `${clamped}%` }}
        />
      </div>
    </div>
  );
}
