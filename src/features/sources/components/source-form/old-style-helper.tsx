import { useId, useMemo, useState } from 'react';
import { ReckonerError } from '@shared/reckoner';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { TextField } from '@/components/text-field';
import { convertOldStyle } from './old-style';

export interface OldStyleHelperProps {
  /** Called with the Gregorian EDTF to put in the date field. */
  onUse: (edtf: string, julian: boolean) => void;
}

/** Converts an Old Style or double date to the modern EDTF the archive stores. */
export function OldStyleHelper({ onUse }: OldStyleHelperProps) {
  const [open, setOpen] = useState(false);
  const [written, setWritten] = useState('');
  const [julian, setJulian] = useState(true);
  const [ladyDay, setLadyDay] = useState(false);
  const panelId = useId();
  const resultId = useId();

  const outcome = useMemo(() => {
    if (!written.trim()) return null;
    try {
      return { result: convertOldStyle(written, { julian, ladyDay }) };
    } catch (error) {
      return { error: error instanceof ReckonerError ? error.message : 'This date could not be read.' };
    }
  }, [written, julian, ladyDay]);

  return (
    <div className="rounded-soft border border-dashed border-rule-strong">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((v) => !v)}
        className="flex w-full items-center justify-between px-3 py-2 text-left text-sm font-medium text-accent-strong"
      >
        Old Style date helper
        <span aria-hidden="true">{open ? '−' : '+'}</span>
      </button>
      <div id={panelId} hidden={!open} className="space-y-3 border-t border-rule px-3 pt-3 pb-4">
        <p className="text-sm text-ink-muted">
          For dates written in the Julian calendar, or with a double year such as <span className="font-serif">10 February 1700/01</span>.
          Windway stores the Gregorian date.
        </p>
        <TextField
          label="Date as the source writes it"
          value={written}
          onChange={(event) => setWritten(event.target.value)}
          error={outcome && 'error' in outcome ? outcome.error : undefined}
          placeholder="10 February 1700/01"
          autoComplete="off"
        />
        <Checkbox label="Written in the Julian calendar (Old Style)" checked={julian} onChange={(e) => setJulian(e.target.checked)} />
        <Checkbox
          label="The writer’s year began on 25 March (Lady Day)"
          hint="Not needed for double years, which already name both."
          checked={ladyDay}
          onChange={(e) => setLadyDay(e.target.checked)}
        />
        <div id={resultId} aria-live="polite" className="min-h-6 text-sm">
          {outcome && 'result' in outcome && outcome.result && (
            <div className="flex flex-wrap items-center gap-3">
              <p>
                <span className="font-medium">{outcome.result.label}</span>{' '}
                <code className="figures rounded bg-paper-sunk px-1">{outcome.result.edtf}</code>
                <span className="block text-ink-muted">{outcome.result.explanation}</span>
              </p>
              <Button size="sm" variant="secondary" onClick={() => outcome.result && onUse(outcome.result.edtf, julian)}>
                Use this date
              </Button>
            </div>
          )}
        </div>
      </div>
    </div>
  );
}
