import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { DECADES, type InsightsResponse } from '@shared/insights/schema';
import { TimelineChart } from '@/features/insights/components/timeline-chart';
import { PitchChart } from '@/features/insights/components/pitch-chart';
import { ConcordancePicture } from '@/features/insights/components/concordance-picture';

// The real Observable Plot, drawn into happy-dom: each chart becomes one labelled SVG image.
const spans: InsightsResponse['timeline']['spans'] = [
  { excerptId: 'E1', sourceId: 'S1', sourceTitle: 'Principes (fictional)', yearEarliest: 1707, yearLatest: 1707, sizes: ['flute-one-keyed'], dateLabel: '1707', approximate: false },
  { excerptId: 'E2', sourceId: 'S2', sourceTitle: 'Inventar (fictional)', yearEarliest: 1740, yearLatest: 1750, sizes: ['bass', 'tenor'], dateLabel: '1740–1750', approximate: true },
  { excerptId: 'E3', sourceId: 'S2', sourceTitle: 'Inventar (fictional)', yearEarliest: 1745, yearLatest: 1745, sizes: ['alto'], dateLabel: '1745', approximate: false },
];

function inRouter(element: React.ReactNode) {
  render(<RouterProvider router={createMemoryRouter([{ path: '/', element }])} />);
}

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

describe('charts drawn with Observable Plot', () => {
  it('draws the timeline spans and the decade bars as labelled images', async () => {
    const decades = DECADES.map((decade) => ({ decade, count: decade === 1700 || decade === 1740 ? 2 : 0 }));
    inRouter(<TimelineChart timeline={{ spans, truncated: false, decades }} total={3} onDecade={() => {}} />);
    const region = screen.getByRole('region', { name: 'When the sources speak' });
    await waitFor(() => expect(within(region).getAllByRole('img')).toHaveLength(2), { timeout: 10_000 });
    const [timeline, bars] = within(region).getAllByRole('img');
    expect(timeline.getAttribute('aria-label')).toBe('Timeline of 3 excerpts between 1500 and 1800');
    expect(bars.getAttribute('aria-label')).toBe('Excerpts per decade, 1500 to 1800');
    expect(timeline.querySelectorAll('rect').length).toBeGreaterThanOrEqual(3);
    // The approximate span is drawn as a dashed outline.
    expect(timeline.querySelector('[stroke-dasharray="3,2"]')).not.toBeNull();
  });

  it('draws the pitch chart with labelled reference lines and a cents axis', async () => {
    const points = spans.map((s, i) => ({ ...s, year: (s.yearEarliest + s.yearLatest) / 2, aHz: [392, 415, 440][i], cents: [-200, -101.3, 0][i] }));
    inRouter(<PitchChart points={points} truncated={false} />);
    const img = await screen.findByRole('img', {}, { timeout: 10_000 });
    expect(img.getAttribute('aria-label')).toContain('392 Hz (Low French)');
    const text = img.textContent ?? '';
    for (const label of ['Low French · 392', 'Baroque · 415', 'Modern · 440', 'High Baroque · 466', 'cents from 440', '−100']) expect(text).toContain(label);
  });

  it('draws the concordance picture', async () => {
    const certainty = { certain: 1, probable: 0, conjectural: 0 };
    inRouter(<ConcordancePicture entries={[{ term: 'flûte douce', language: 'fr', excerpts: 3, sizes: [{ sizeSlug: 'alto', sizeName: 'Alto recorder', excerpts: 3, certainty, examples: [] }] }]} />);
    const img = await screen.findByRole('img', {}, { timeout: 10_000 });
    expect(img.textContent).toContain('flûte douce (fr)');
    expect(img.querySelectorAll('circle')).toHaveLength(1);
  });
});
