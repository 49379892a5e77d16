import { useDeferredValue, useId, useMemo, useState } from 'react';
import { formatIsoDate, monthName, parseDualDate } from '@shared/reckoner';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { attempt } from '../lib/outcome';

/**
 * Reads a double-dated day ("10 February 1700/01") and offers it to the date field as the
 * writer's own year under a year beginning on 25 March, which is how the reckoner takes it.
 */
export function DualDateHelper({ onUse }: { onUse: (value: string) => void }) {
  const [text, setText] = useState('');
  const deferred = useDeferredValue(text);
  const headingId = useId();
  const outcome = useMemo(() => (deferred.trim() === '' ? undefined : attempt(() => parseDualDate(deferred, 'dual'))), [deferred]);
  const dual = outcome?.ok ? outcome.value : undefined;
  const written = dual ? formatIsoDate({ ...dual.modern, year: dual.writtenYear }) : undefined;

  return (
    <div role="group" aria-labelledby={headingId} className="rounded-soft border border-dashed border-rule-strong bg-paper px-4 py-4">
      <h3 id={headingId} className="font-medium text-ink">
        Double-dated day
      </h3>
      <p className="mt-1 text-sm text-ink-muted">
        Between 1 January and 24 March, English writers before 1752 often gave both years.
      </p>
      <TextField
        id="reckoner-dual"
        containerClassName="mt-3"
        label="As written"
        value={text}
        onChange={(event) => setText(event.target.value)}
        placeholder="10 February 1700/01"
        error={outcome && !outcome.ok ? outcome.message : undefined}
        autoComplete="off"
        spellCheck={false}
      />
      {dual && written && (
        <div className="mt-3 space-y-2 text-sm">
          <p aria-live="polite">
            <span className="figures">
              {dual.modern.day} {monthName(dual.modern.month)} {dual.modern.year}
            </span>{' '}
            in modern year numbering (still in the source’s calendar); the writer’s year was{' '}
            <span className="figures">{dual.writtenYear}</span>.
          </p>
          <Button size="sm" variant="secondary" onClick={() => onUse(written)}>
            <span>
              Reckon <span className="figures whitespace-nowrap">{written}</span> with the year from 25 March
            </span>
          </Button>
          <p className="text-ink-muted">English double dates are usually in the Julian calendar too: choose it above.</p>
        </div>
      )}
    </div>
  );
}
