import { A4_MAX_HZ, A4_MIN_HZ, PITCH_STANDARDS } from '@shared/reckoner';
import { TextField } from '@/components/text-field';
import { cn } from '@/lib/cn';

export interface PitchFieldProps {
  id: string;
  label: string;
  value: string;
  error?: string;
  onChange: (value: string, immediate: boolean) => void;
  /** Offer the named standards as toggle buttons. */
  quickPicks?: boolean;
  hint?: string;
}

/** a′ in hertz, typed or picked from the working standards of today's historical performance. */
export function PitchField({ id, label, value, error, onChange, quickPicks = false, hint }: PitchFieldProps) {
  const current = Number(value);
  return (
    <div>
      <TextField
        id={id}
        label={label}
        type="number"
        inputMode="decimal"
        min={A4_MIN_HZ}
        max={A4_MAX_HZ}
        step="any"
        value={value}
        onChange={(event) => onChange(event.target.value, false)}
        hint={hint ?? `Between ${A4_MIN_HZ} and ${A4_MAX_HZ} Hz.`}
        error={error}
        className="figures max-w-40"
        autoComplete="off"
      />
      {quickPicks && (
        <div role="group" aria-label="Named pitch standards" className="mt-3 flex flex-wrap gap-2">
          {PITCH_STANDARDS.map((standard) => {
            const pressed = value.trim() !== '' && current === standard.hz;
            return (
              <button
                key={standard.hz}
                type="button"
                aria-pressed={pressed}
                title={standard.description}
                onClick={() => onChange(String(standard.hz), true)}
                className={cn(
                  'flex min-w-[5.5rem] flex-col items-start rounded-soft border px-3 py-1.5 text-left transition-colors',
                  pressed
                    ? 'border-accent bg-accent-soft text-accent-strong shadow-[inset_0_-2px_0_var(--color-accent)]'
                    : 'border-rule-strong bg-paper-raised text-ink hover:bg-paper-sunk',
                )}
              >
                <span className="figures font-medium">
                  {pressed && <span aria-hidden="true">● </span>}
                  {standard.hz} Hz
                </span>{' '}
                <span className="text-xs text-ink-muted">{standard.shortName}</span>
              </button>
            );
          })}
        </div>
      )}
    </div>
  );
}
