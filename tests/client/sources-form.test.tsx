import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import type { SourceDetail } from '@shared/catalogue/types';
import { SourceForm } from '@/features/sources/components/source-form/source-form';
import { clearCsrfToken } from '@/lib/api';
import { createTestQueryClient, json, stubFetch, withQueryClient } from './support';

// happy-dom has no HTMLSelectElement.size, so react-hook-form takes a fresh <select> for one the
// person already changed and keeps its empty value instead of the default (browsers report 0).
if (!('size' in HTMLSelectElement.prototype)) {
  Object.defineProperty(HTMLSelectElement.prototype, 'size', { configurable: true, get: () => 0 });
}

function renderForm(props: Partial<Parameters<typeof SourceForm>[0]> = {}) {
  const Wrapper = withQueryClient(createTestQueryClient());
  const onSaved = vi.fn();
  const view = render(
    <Wrapper>
      <MemoryRouter>
        <SourceForm onSaved={onSaved} {...props} />
      </MemoryRouter>
    </Wrapper>,
  );
  return { ...view, onSaved };
}

/** The text of everything an input's aria-describedby points at. */
function description(element: HTMLElement): string {
  return (element.getAttribute('aria-describedby') ?? '')
    .split(' ')
    .filter(Boolean)
    .map((id) => document.getElementById(id)?.textContent ?? '')
    .join(' ');
}

function fillValidSource() {
  fireEvent.input(screen.getByLabelText('Title'), { target: { value: 'The Compleat Flute-Master' } });
  fireEvent.change(screen.getByLabelText('Kind of source'), { target: { value: 'tutor' } });
  fireEvent.input(screen.getByLabelText('Date (EDTF)'), { target: { value: '1695' } });
  fireEvent.click(screen.getByRole('button', { name: 'English' }));
}

const savedSource = { id: 'S7K2QX9A', title: 'The Compleat Flute-Master', version: 1 } as SourceDetail;

/** A saved source at version 3, as GET /api/sources/:id gives it. */
const accountBook = {
  id: 'S7K2QX9A',
  title: 'Account book of the chapel',
  sourceType: 'account',
  creators: [],
  date: { edtf: '1701', label: '1701', earliest: '1701-01-01', latest: '1701-12-31' },
  calendarNote: 'unstated',
  place: 'Oderstadt',
  languages: ['de'],
  holdingInstitution: null,
  shelfmark: null,
  publication: null,
  externalUrl: null,
  rightsStatement: null,
  facsimileAccess: 'signed-in',
  version: 3,
} as unknown as SourceDetail;

beforeEach(() => {
  clearCsrfToken();
  window.localStorage.clear();
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('SourceForm', () => {
  it('shows the shared schema’s messages under the empty fields and sends nothing', async () => {
    const calls = stubFetch(() => json({}));
    renderForm();

    fireEvent.click(screen.getByRole('button', { name: 'Save as draft' }));

    const title = screen.getByLabelText('Title');
    await waitFor(() => expect(title.getAttribute('aria-invalid')).toBe('true'));
    expect(description(title)).toContain('Enter the title as it appears');
    expect(description(screen.getByLabelText('Kind of source'))).toContain('Choose the kind of source');
    expect(description(screen.getByLabelText('Date (EDTF)'))).toContain('Enter a date in EDTF');
    expect(description(screen.getByLabelText('Languages'))).toContain('Add at least one language');

    const summary = screen.getByRole('alert');
    expect(summary.textContent).toContain('Please check these fields');
    expect(summary.textContent).toContain('Title: Enter the title');
    expect(calls).toHaveLength(0);
  });

  it('explains an EDTF value the Reckoner cannot read', async () => {
    stubFetch(() => json({}));
    renderForm();
    fillValidSource();
    fireEvent.input(screen.getByLabelText('Date (EDTF)'), { target: { value: '1700/1690' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save as draft' }));
    await waitFor(() => expect(description(screen.getByLabelText('Date (EDTF)'))).toContain('ends before it begins'));
  });

  it('puts the server’s field messages beside the fields they name', async () => {
    const calls = stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : json(
            {
              error: {
                code: 'validation_failed',
                message: 'Some fields need attention.',
                fields: { title: 'A source with this title is already catalogued', 'languages.0': 'Not a language Windway knows' },
              },
            },
            400,
          ),
    );
    const { onSaved } = renderForm();
    fillValidSource();
    fireEvent.click(screen.getByRole('button', { name: 'Save as draft' }));

    await waitFor(() => expect(description(screen.getByLabelText('Title'))).toContain('already catalogued'));
    expect(description(screen.getByLabelText('Languages'))).toContain('Not a language Windway knows');
    expect(screen.getByRole('alert').textContent).toContain('The source was not saved');
    const post = calls.find((c) => c.method === 'POST');
    expect(post?.url).toBe('/api/sources');
    expect(post?.body).toMatchObject({ title: 'The Compleat Flute-Master', sourceType: 'tutor', dateEdtf: '1695', languages: ['en'], publication: null });
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('keeps typed values in the browser across a remount and offers them back', async () => {
    stubFetch(() => json({}));
    const first = renderForm();
    fireEvent.input(screen.getByLabelText('Title'), { target: { value: 'Inventory of the Hofkapelle, 1706' } });
    first.unmount();

    renderForm();
    expect(await screen.findByText('Unsaved changes from an earlier visit')).toBeTruthy();
    expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe('');
    fireEvent.click(screen.getByRole('button', { name: 'Restore my changes' }));
    await waitFor(() => expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe('Inventory of the Hofkapelle, 1706'));
  });

  it('clears the browser copy after a successful save', async () => {
    stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : json({ data: savedSource, abilities: {} }, 201),
    );
    const first = renderForm();
    fillValidSource();
    fireEvent.click(screen.getByRole('button', { name: 'Save as draft' }));
    await waitFor(() => expect(first.onSaved).toHaveBeenCalledWith(savedSource));
    first.unmount();

    renderForm();
    expect(screen.queryByText('Unsaved changes from an earlier visit')).toBeNull();
  });

  it('keeps the person’s text after a 409 and re-applies it on the latest version', async () => {
    const source = accountBook;
    const latest = { ...source, place: 'Oderstadt (court)', version: 4 };
    const calls = stubFetch((call) => {
      if (call.url === '/api/auth/me') return json({ user: null, csrfToken: 't1', demo: false, mailCapture: false });
      if (call.method === 'PATCH') {
        const body = call.body as { version: number };
        return body.version === 3
          ? json({ error: { code: 'conflict', message: 'Changed elsewhere' } }, 409)
          : json({ data: { ...latest, version: 5 }, abilities: {} });
      }
      return json({ data: latest, abilities: {} });
    });
    const { onSaved } = renderForm({ source });

    fireEvent.input(screen.getByLabelText('Title'), { target: { value: 'Account book of the Oderstadt chapel' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText(/changed by someone else/)).toBeTruthy();
    expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe('Account book of the Oderstadt chapel');

    fireEvent.click(screen.getByRole('button', { name: 'Reload latest and re-apply my changes' }));
    await screen.findByText('Your changes now sit on version 4');
    expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe('Account book of the Oderstadt chapel');
    expect((screen.getByLabelText(/^Place/) as HTMLInputElement).value).toBe('Oderstadt (court)');

    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    const patches = calls.filter((c) => c.method === 'PATCH');
    expect(patches.map((p) => (p.body as { version: number }).version)).toEqual([3, 4]);
    expect(patches[1].body).toMatchObject({ title: 'Account book of the Oderstadt chapel', place: 'Oderstadt (court)' });
  });

  it('lets an editor publish a correction to an approved source, with a reason, and asks for one first', async () => {
    const source = { ...accountBook, status: 'approved' } as SourceDetail;
    const calls = stubFetch((call) => {
      if (call.url === '/api/auth/me') return json({ user: null, csrfToken: 't1', demo: false, mailCapture: false });
      return json({ data: { ...source, version: 4 }, abilities: {} });
    });
    const { onSaved } = renderForm({ source, canPublish: true });

    fireEvent.input(screen.getByLabelText('Title'), { target: { value: 'Account book of the Oderstadt chapel' } });
    fireEvent.click(screen.getByLabelText('Publish this change at once, without a new review'));
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    const reason = await screen.findByLabelText('Why this change is published without review');
    await waitFor(() => expect(description(reason)).toMatch(/Say why this change is published without review/));
    expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(0);

    fireEvent.input(reason, { target: { value: 'Typo in the title' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(calls.find((c) => c.method === 'PATCH')?.body).toMatchObject({ version: 3, publish: true, reason: 'Typo in the title', title: 'Account book of the Oderstadt chapel' });
  });

  it('offers no publishing to those who may not, and sends no publish flag', async () => {
    const calls = stubFetch((call) =>
      call.url === '/api/auth/me' ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false }) : json({ data: { ...savedSource, version: 2 }, abilities: {} }),
    );
    const source = { ...savedSource, sourceType: 'tutor', date: { edtf: '1695', label: '1695' }, languages: ['en'], creators: [], status: 'approved' } as unknown as SourceDetail;
    const { onSaved } = renderForm({ source });
    expect(screen.queryByLabelText('Publish this change at once, without a new review')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(calls.find((c) => c.method === 'PATCH')?.body).not.toHaveProperty('publish');
  });

  it('converts an Old Style double date to the Gregorian EDTF', async () => {
    stubFetch(() => json({}));
    renderForm();
    fireEvent.click(screen.getByRole('button', { name: /Old Style date helper/ }));
    fireEvent.change(screen.getByLabelText('Date as the source writes it'), { target: { value: '10 February 1700/01' } });

    // 10 Feb 1700/01 is 10 Feb 1701 (modern year); Julian → Gregorian adds 11 days after the Julian leap day of 1700
    // (Calendar (New Style) Act 1750; Meeus, Astronomical Algorithms, ch. 7): 21 February 1701.
    expect(await screen.findByText('21 February 1701')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Use this date' }));
    expect((screen.getByLabelText('Date (EDTF)') as HTMLInputElement).value).toBe('1701-02-21');
    expect((screen.getByLabelText('Calendar') as HTMLSelectElement).value).toBe('old-style');
    expect(await screen.findByText(/Reads as/)).toBeTruthy();
  });
});
