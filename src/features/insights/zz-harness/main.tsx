import './harness.css';
import '@fontsource/inter/400.css';
import '@fontsource/eb-garamond/400.css';
import { createRoot } from 'react-dom/client';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { DECADES, type InsightsResponse } from '@shared/insights/schema';
import { TimelineChart } from '../components/timeline-chart';
import { PitchChart } from '../components/pitch-chart';
import { ConcordancePicture } from '../components/concordance-picture';
import { SIZE_SLUGS } from '@shared/reckoner/sizes';

let seed = 7;
const rnd = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
const spans: InsightsResponse['timeline']['spans'] = Array.from({ length: 60 }, (_, i) => {
  const y0 = Math.round(1560 + rnd() * 220);
  const wide = rnd() < 0.35;
  const y1 = wide ? y0 + Math.round(rnd() * 25) : y0;
  const sizes = rnd() < 0.15 ? [SIZE_SLUGS[2], SIZE_SLUGS[4]] : [SIZE_SLUGS[Math.floor(rnd() * SIZE_SLUGS.length)]];
  return { excerptId: `E${i}`, sourceId: 'S1', sourceTitle: `Source ${i}`, yearEarliest: y0, yearLatest: y1, sizes, dateLabel: wide ? `${y0}–${y1}` : String(y0), approximate: wide };
});
const decades = DECADES.map((decade) => ({ decade, count: spans.filter((s) => s.yearEarliest < decade + 10 && s.yearLatest >= decade).length }));
const hz = [392, 415, 440, 466, 403, 430, 421];
const points = spans.slice(0, 30).map((s, i) => ({ ...s, year: (s.yearEarliest + s.yearLatest) / 2, aHz: hz[i % hz.length], cents: Math.round(12000 * Math.log2(hz[i % hz.length] / 440)) / 10 }));
const certainty = { certain: 1, probable: 0, conjectural: 0 };
const entries = [
  ['flûte douce', 'fr', [['alto', 'Alto recorder', 9], ['tenor', 'Tenor recorder', 2]]],
  ['Handtflöten', 'de', [['alto', 'Alto recorder', 3]]],
  ['flauto', 'it', [['alto', 'Alto recorder', 5], ['soprano', 'Soprano recorder', 1]]],
  ['basse de flûte', 'fr', [['bass', 'Bass recorder', 4]]],
  ['German flute', 'en', [['flute-one-keyed', 'One-keyed flute', 7]]],
] as const;
const conc = entries.map(([term, language, sizes]) => ({ term, language, excerpts: sizes.reduce((n, s) => n + s[2], 0), sizes: sizes.map(([sizeSlug, sizeName, excerpts]) => ({ sizeSlug, sizeName, excerpts, certainty, examples: [] })) }));

function App() {
  return (
    <div className="grid gap-8">
      <TimelineChart timeline={{ spans, decades, truncated: false }} total={64} onDecade={(d) => alert(d)} selectedDecade={1700} decadeVerb="narrow the search to" />
      <PitchChart points={points} truncated={false} />
      <ConcordancePicture entries={conc} />
    </div>
  );
}
createRoot(document.getElementById('root')!).render(<RouterProvider router={createMemoryRouter([{ path: '*', element: <App /> }])} />);
