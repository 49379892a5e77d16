import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { resolveSizeDescription } from '@shared/reckoner';
import { ExcerptForm } from '@/features/excerpts/components/excerpt-editor/excerpt-form';
import { clearCsrfToken } from '@/lib/api';
import { createTestQueryClient, json, stubFetch, withQueryClient } from './support';

// happy-dom has no HTMLSelectElement.size; react-hook-form needs it to keep a <select>'s default value.
if (!('size' in HTMLSelectElement.prototype)) {
  Object.defineProperty(HTMLSelectElement.prototype, 'size', { configurable: true, get: () => 0 });
}

function renderEditor() {
  const Wrapper = withQueryClient(createTestQueryClient());
  const onSaved = vi.fn();
  render(
    <Wrapper>
      <MemoryRouter>
        <ExcerptForm source={{ id: 'S7K2QX9A', languages: ['fr'], dateLabel: 'c. 1700' }} currentPage={12} onSaved={onSaved} />
      </MemoryRouter>
    </Wrapper>,
  );
  return onSaved;
}

beforeEach(() => {
  clearCsrfToken();
  window.localStorage.clear();
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('Excerpt editor: pitch tags', () => {
  it('reads an a′ of 415 Hz in cents from 440 and names the nearest standard', async () => {
    stubFetch(() => json({ data: [] }));
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Add a pitch tag' }));

    const input = await screen.findByLabelText('Tag 1: a′ in Hz');
    fireEvent.input(input, { target: { value: '415' } });

    // 1200·log2(415/440) = −101.27 cents (Ellis 1885's cent); 415 Hz is the "Baroque" working standard (shared/reckoner PITCH_STANDARDS).
    await waitFor(() => expect(document.getElementById(`${input.id}-reading`)?.textContent).toContain('−101.3 cents'));
    const reading = document.getElementById(`${input.id}-reading`)?.textContent ?? '';
    expect(reading).toContain('from a′ = 440 Hz');
    expect(reading).toContain('Baroque');
    expect(reading).toContain('a′ = 415 Hz');
    expect(input.getAttribute('aria-describedby')).toContain(`${input.id}-reading`);
  });

  it('names the nearest standard and its distance for an a′ between standards', async () => {
    stubFetch(() => json({ data: [] }));
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Add a pitch tag' }));
    const input = await screen.findByLabelText('Tag 1: a′ in Hz');
    fireEvent.input(input, { target: { value: '409' } });
    // 1200·log2(409/440) = −126.5; nearest is 415 Hz at 1200·log2(409/415) = −25.2 cents.
    await waitFor(() => expect(document.getElementById(`${input.id}-reading`)?.textContent).toContain('−126.5 cents'));
    expect(document.getElementById(`${input.id}-reading`)?.textContent).toContain('−25.2 cents');
  });

  it('explains an a′ outside the accepted range', async () => {
    stubFetch(() => json({ data: [] }));
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Add a pitch tag' }));
    const input = await screen.findByLabelText('Tag 1: a′ in Hz');
    fireEvent.input(input, { target: { value: '44' } });
    await waitFor(() => expect(document.getElementById(`${input.id}-reading`)?.textContent).toContain('outside the accepted 350–500 Hz'));
  });
});

describe('Excerpt editor: relative size', () => {
  it('proposes the size the shared parser resolves and fills the size select', async () => {
    // The shared parser is the authority: alto F4, a minor third (3 semitones) lower is D4, the voice flute.
    expect(resolveSizeDescription('a minor third below the alto').size.slug).toBe('voice-flute');

    stubFetch(() => json({ data: [] }));
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Add an instrument mention' }));

    const describe = await screen.findByLabelText(/Describe the size relative to another/);
    fireEvent.change(describe, { target: { value: 'a minor third below the alto' } });
    fireEvent.click(screen.getByRole('button', { name: 'Propose a size' }));

    const proposal = await screen.findByText('Voice flute', { selector: 'strong' });
    expect(proposal.getAttribute('data-slug')).toBe('voice-flute');
    fireEvent.click(screen.getByRole('button', { name: 'Use Voice flute' }));
    await waitFor(() => expect((screen.getByLabelText('Mention 1: size') as HTMLSelectElement).value).toBe('voice-flute'));
  });

  it('shows the parser’s own message inline when no size fits', async () => {
    stubFetch(() => json({ data: [] }));
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Add an instrument mention' }));
    const describe = await screen.findByLabelText(/Describe the size relative to another/);
    fireEvent.change(describe, { target: { value: 'a fifth below the treble' } });
    fireEvent.click(screen.getByRole('button', { name: 'Propose a size' }));

    let expected = '';
    try {
      resolveSizeDescription('a fifth below the treble');
    } catch (error) {
      expected = (error as Error).message;
    }
    expect(expected).toContain('No recorder size');
    await waitFor(() => expect(document.getElementById(describe.getAttribute('aria-describedby') ?? '')?.textContent).toContain(expected));
    expect(describe.getAttribute('aria-invalid')).toBe('true');
  });
});

describe('Excerpt editor: locator and saving', () => {
  it('checks the locator with the shared rule and fills the facsimile page from the viewer', async () => {
    stubFetch(() => json({ data: [] }));
    renderEditor();
    fireEvent.change(screen.getByLabelText('Locator type'), { target: { value: 'folio' } });
    fireEvent.input(screen.getByLabelText('Locator'), { target: { value: '12' } });
    fireEvent.input(screen.getByLabelText('Diplomatic transcription'), { target: { value: 'La Flute a bec' } });
    fireEvent.click(screen.getByRole('button', { name: 'Use current page (12)' }));
    expect((screen.getByLabelText(/^Facsimile page/) as HTMLInputElement).value).toBe('12');

    fireEvent.click(screen.getByRole('button', { name: 'Save excerpt' }));
    await waitFor(() => expect(screen.getByLabelText('Locator').getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByRole('alert').textContent).toContain('Write a folio as in 12v, 3r');
  });

  it('sends the shared schema’s output and places the server’s nested field errors', async () => {
    const calls = stubFetch((call) => {
      if (call.url === '/api/auth/me') return json({ user: null, csrfToken: 't1', demo: false, mailCapture: false });
      if (call.method === 'POST') return json({ error: { code: 'validation_failed', message: 'Some fields need attention.', fields: { 'pitchTags.0.aHz': 'Check this a′ against the statement' } } }, 400);
      return json({ data: [] });
    });
    renderEditor();
    fireEvent.input(screen.getByLabelText('Locator'), { target: { value: '23' } });
    fireEvent.input(screen.getByLabelText('Diplomatic transcription'), { target: { value: 'un ton plus bas' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add a pitch tag' }));
    fireEvent.input(await screen.findByLabelText('Tag 1: what the source says'), { target: { value: 'un ton plus bas que l’Opéra' } });
    fireEvent.input(screen.getByLabelText('Tag 1: a′ in Hz'), { target: { value: '392' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save excerpt' }));

    await waitFor(() => expect(screen.getByLabelText('Tag 1: a′ in Hz').getAttribute('aria-invalid')).toBe('true'));
    const post = calls.find((c) => c.method === 'POST');
    expect(post?.url).toBe('/api/sources/S7K2QX9A/excerpts');
    expect(post?.body).toMatchObject({
      locatorType: 'page',
      locatorValue: '23',
      facsimilePage: null,
      dateEdtf: null,
      translationLanguage: null,
      pitchTags: [{ statement: 'un ton plus bas que l’Opéra', aHz: 392, derivation: 'stated', note: null }],
    });
    expect(screen.getByText('Check this a′ against the statement')).toBeTruthy();
  });
});
