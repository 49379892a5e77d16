import { useMemo } from 'react';
import { reckonDate } from '@shared/reckoner';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { apiUrl } from '../lib/format';
import { attempt, errorFor } from '../lib/outcome';
import type { ReckonerState, ReckonerUpdate } from '../lib/state';
import { writtenDayToEdtf } from '../lib/written-day';
import { DualDateHelper } from './dual-date-helper';
import { ApiNote, LiveSummary, ReckonerSection, Readings } from './section';

const calendarOptions = [
  { value: 'gregorian', label: 'Gregorian (New Style)' },
  { value: 'julian', label: 'Julian (Old Style)' },
];
const yearStartOptions = [
  { value: 'jan1', label: '1 January' },
  { value: 'mar25', label: '25 March (Lady Day)' },
];

function reckon(state: ReckonerState) {
  const typed = state.date.trim();
  if (typed === '') return undefined;
  const value = writtenDayToEdtf(typed) ?? typed;
  return attempt(() => ({ value, reading: reckonDate({ value, calendar: state.calendar, yearStart: state.yearStart }, 'date') }), 'date');
}

export function DateSection({ values, settled, update }: { values: ReckonerState; settled: ReckonerState; update: ReckonerUpdate }) {
  const outcome = useMemo(() => reckon(settled), [settled]);
  const result = outcome?.ok ? outcome.value : undefined;
  const reading = result?.reading;
  const readAs = result && result.value !== settled.date.trim() ? result.value : undefined;

  return (
    <ReckonerSection
      id="date"
      eyebrow="Dates"
      title="Historical date"
      intro="A date as EDTF or as a day, read in the calendar and year numbering of its source, with the days it covers for searching."
    >
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="space-y-4">
          <TextField
            id="reckoner-date"
            label="Date"
            value={values.date}
            onChange={(event) => update({ date: event.target.value })}
            placeholder="1700-02-10"
            hint="EDTF such as 1700, 1700~ (about), 169X (1690s), 1700/1725, ../1760 (before 1760), or a day: 1700-02-10, 10 February 1700."
            error={errorFor(outcome, 'date', 'value')}
            className="figures"
            autoComplete="off"
            spellCheck={false}
          />
          <div className="grid gap-4 sm:grid-cols-2">
            <Select
              id="reckoner-calendar"
              label="Calendar"
              value={values.calendar}
              options={calendarOptions}
              onChange={(event) => update({ calendar: event.target.value as ReckonerState['calendar'] }, { immediate: true })}
            />
            <Select
              id="reckoner-year-start"
              label="Year begins on"
              value={values.yearStart}
              options={yearStartOptions}
              onChange={(event) => update({ yearStart: event.target.value as ReckonerState['yearStart'] }, { immediate: true })}
            />
          </div>

          <div className="rounded-soft border border-rule bg-paper px-4 py-4">
            {reading ? (
              <Readings
                items={[
                  { term: 'Label', detail: <span className="font-serif text-xl">{reading.label}</span> },
                  { term: 'EDTF', detail: reading.edtf, note: readAs ? `read from “${settled.date.trim()}” as ${readAs}` : undefined },
                  ...(reading.gregorian ? [{ term: 'Gregorian date', detail: reading.gregorian }] : []),
                  ...(reading.julianDay !== undefined ? [{ term: 'Julian Day', detail: String(reading.julianDay), note: 'at 0h UT' }] : []),
                  { term: 'Earliest day', detail: reading.earliest },
                  { term: 'Latest day', detail: reading.latest },
                ]}
              />
            ) : (
              <p className="text-ink-muted">
                {outcome ? 'Not a date we can read: see the message under the field.' : 'The reading appears here as you type.'}
              </p>
            )}
          </div>
        </div>
        <DualDateHelper onUse={(date) => update({ date, yearStart: 'mar25' }, { immediate: true })} />
      </div>
      <LiveSummary>
        {reading
          ? `${reading.label}: from ${reading.earliest} to ${reading.latest}${reading.gregorian ? `, Gregorian ${reading.gregorian}` : ''}.`
          : outcome && !outcome.ok
            ? `Error: ${outcome.message}`
            : ''}
      </LiveSummary>
      <ApiNote
        urls={result ? [apiUrl('date', { value: result.value, calendar: settled.calendar, yearStart: settled.yearStart })] : []}
      />
    </ReckonerSection>
  );
}

