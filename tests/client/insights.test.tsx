import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import type { InsightsResponse } from '@shared/insights/schema';
import { DECADES } from '@shared/insights/schema';
import type { ConcordanceEntry } from '@shared/review/types';
import { HomeInsights, SearchInsights } from '@/features/insights/components/insights-panel';
import { ConcordancePicture } from '@/features/insights/components/concordance-picture';
import { createTestQueryClient, json, stubFetch, type RecordedCall } from './support';

// Plot is never loaded here: the charts' text, tables and decade buttons work without it.
vi.mock('@/features/insights/lib/load-plot', () => ({ loadPlot: () => new Promise(() => {}) }));

const fixture: InsightsResponse = {
  timeline: {
    spans: [
      { excerptId: 'E0000101', sourceId: 'S0000001', sourceTitle: 'Principes de la flûte (fictional)', yearEarliest: 1707, yearLatest: 1707, sizes: ['flute-one-keyed'], dateLabel: '1707', approximate: false },
      { excerptId: 'E0000102', sourceId: 'S0000002', sourceTitle: 'Inventar der Hofkapelle (fictional)', yearEarliest: 1740, yearLatest: 1750, sizes: ['bass', 'tenor'], dateLabel: '1740–1750', approximate: true },
    ],
    truncated: false,
    decades: DECADES.map((decade) => ({ decade, count: decade === 1700 ? 1 : decade === 1740 || decade === 1750 ? 1 : 0 })),
  },
  pitch: {
    points: [
      { excerptId: 'E0000101', sourceTitle: 'Principes de la flûte (fictional)', year: 1707, yearEarliest: 1707, yearLatest: 1707, dateLabel: '1707', aHz: 392, cents: -200, sizes: ['flute-one-keyed'] },
      { excerptId: 'E0000102', sourceTitle: 'Inventar der Hofkapelle (fictional)', year: 1745, yearEarliest: 1740, yearLatest: 1750, dateLabel: '1740–1750', aHz: 415, cents: -101.3, sizes: ['bass', 'tenor'] },
    ],
    truncated: false,
  },
  total: 3,
};

let calls: RecordedCall[];
beforeEach(() => {
  calls = stubFetch(() => json(fixture));
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderAt(url: string, element: React.ReactNode) {
  const router = createMemoryRouter(
    [
      { path: '/', element },
      { path: '/search', element },
      { path: '/excerpts/:id', element: <p>Excerpt page</p> },
    ],
    { initialEntries: [url] },
  );
  render(
    <QueryClientProvider client={createTestQueryClient()}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

const timeline = () => screen.getByRole('region', { name: 'When the sources speak' });
const pitch = () => screen.getByRole('region', { name: 'At what pitch' });

describe('Insights on the search page', () => {
  it('asks for the charts of the URL’s filters only (no paging), and summarises them in words', async () => {
    renderAt('/search?q=flute&size=alto&size=tenor&page=3&sort=oldest&from=nonsense', <SearchInsights />);
    await screen.findByRole('region', { name: 'When the sources speak' });
    expect(calls[0].url).toBe('/api/insights?q=flute&size=alto%2Ctenor');
    expect(timeline().textContent).toContain('2 dated excerpts between 1707 and 1750');
    expect(timeline().textContent).toContain('1 of them is dated only to a range or approximately');
    expect(pitch().textContent).toContain('a′ from 392 to 415 Hz');
  });

  it('lists the spans, decades and pitch points in tables on “Show as table”', async () => {
    renderAt('/search?q=flute', <SearchInsights />);
    await screen.findByRole('region', { name: 'When the sources speak' });
    fireEvent.click(within(timeline()).getByRole('button', { name: 'Show as table' }));
    const spans = within(timeline()).getByRole('table', { name: 'Dated excerpts' });
    const rows = within(spans).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[1].textContent).toContain('1740–1750');
    expect(rows[1].textContent).toContain('range or approximate');
    expect(rows[1].textContent).toContain('Bass recorder, Tenor recorder');
    expect(within(rows[0]).getByRole('link').getAttribute('href')).toBe('/excerpts/E0000101');
    expect(within(within(timeline()).getByRole('table', { name: 'Excerpts per decade' })).getAllByRole('row')).toHaveLength(31);

    fireEvent.click(within(pitch()).getByRole('button', { name: 'Show as table' }));
    const points = within(within(pitch()).getByRole('table')).getAllByRole('row').slice(1);
    expect(points.map((r) => r.textContent)).toEqual([expect.stringContaining('392−200'), expect.stringContaining('415−101.3')]);
  });

  it('narrows the search to a decade from the keyboard: arrows move along the decades, Enter chooses', async () => {
    const router = renderAt('/search?q=flute&size=alto&page=4', <SearchInsights />);
    const strip = await screen.findByRole('toolbar', { name: /Decades/ });
    const first = within(strip).getByRole('button', { name: '1700s: 1 excerpt' });
    expect(first.tabIndex).toBe(0);
    act(() => first.focus());
    fireEvent.keyDown(first, { key: 'ArrowRight' });
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowRight' });
    expect(document.activeElement?.getAttribute('aria-label')).toBe('1720s: 0 excerpts');
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowLeft' });
    // A focused button is activated by Enter; the click is what the browser then fires.
    fireEvent.click(document.activeElement!);
    await waitFor(() => expect(router.state.location.search).toBe('?q=flute&size=alto&from=1710&to=1719'));
    await waitFor(() => expect(calls.at(-1)?.url).toBe('/api/insights?q=flute&size=alto&from=1710&to=1719'));
    expect(within(strip).getByRole('button', { name: '1710s: 0 excerpts' }).getAttribute('aria-pressed')).toBe('true');
  });

  it('steps through the pitch points with the arrow keys and opens one with Enter', async () => {
    const router = renderAt('/search', <SearchInsights />);
    const chart = await screen.findByRole('group', { name: /Pitch points/ });
    fireEvent.keyDown(chart, { key: 'ArrowRight' });
    expect(pitch().textContent).toContain('Principes de la flûte (fictional), 1707: a′ = 392 Hz (−200 cents from 440)');
    fireEvent.keyDown(chart, { key: 'ArrowRight' });
    fireEvent.keyDown(chart, { key: 'Enter' });
    await waitFor(() => expect(router.state.location.pathname).toBe('/excerpts/E0000102'));
  });
});

describe('Insights on the home page', () => {
  it('shows all approved material and opens the search for a chosen decade', async () => {
    const router = renderAt('/?q=ignored', <HomeInsights />);
    await screen.findByRole('region', { name: 'When the sources speak' });
    expect(calls[0].url).toBe('/api/insights?scope=public');
    fireEvent.click(within(timeline()).getByRole('button', { name: 'Show as table' }));
    fireEvent.click(within(timeline()).getByRole('button', { name: 'search the 1740s' }));
    await waitFor(() => expect(router.state.location.pathname + router.state.location.search).toBe('/search?from=1740&to=1749'));
  });
});

describe('Concordance picture', () => {
  const entries: ConcordanceEntry[] = [
    { term: 'flûte douce', language: 'fr', excerpts: 3, sizes: [{ sizeSlug: 'alto', sizeName: 'Alto recorder', excerpts: 3, certainty: { certain: 3, probable: 0, conjectural: 0 }, examples: [] }] },
    {
      term: 'Handtflöten', language: 'de', excerpts: 2,
      sizes: [
        { sizeSlug: 'alto', sizeName: 'Alto recorder', excerpts: 1, certainty: { certain: 0, probable: 1, conjectural: 0 }, examples: [] },
        { sizeSlug: 'tenor', sizeName: 'Tenor recorder', excerpts: 1, certainty: { certain: 0, probable: 0, conjectural: 1 }, examples: [] },
      ],
    },
  ];

  it('has a table of every term and size with its excerpt count', () => {
    render(<ConcordancePicture entries={entries} />);
    const region = screen.getByRole('region', { name: 'Terms and sizes' });
    expect(region.textContent).toContain('2 historical terms for 2 sizes');
    fireEvent.click(within(region).getByRole('button', { name: 'Show as table' }));
    const rows = within(within(region).getByRole('table')).getAllByRole('row').slice(1).map((r) => r.textContent);
    expect(rows).toEqual(['flûte doucefrAlto recorder3', 'HandtflötendeAlto recorder1', 'HandtflötendeTenor recorder1']);
  });
});
