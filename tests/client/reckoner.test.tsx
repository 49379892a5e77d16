import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { ReckonerError, fingeringKey, resolveSizeDescription, validateA4 } from '@shared/reckoner';
import { Component as ReckonerPage } from '@/features/reckoner/routes/reckoner';

function renderReckoner(search = '') {
  const router = createMemoryRouter([{ path: '/reckoner', element: <ReckonerPage /> }], {
    initialEntries: [`/reckoner${search}`],
  });
  render(<RouterProvider router={router} />);
  return router;
}

const region = (name: string) => screen.getByRole('region', { name });
/** Visible text with glyph accidentals turned back into the shared code's ASCII spelling. */
const ascii = (text: string | null | undefined) => (text ?? '').replace(/♯/g, '#').replace(/♭/g, 'b');
/** Text as seen on screen: without the spelled-out words kept for screen readers. */
function visibleText(element: Element): string {
  const copy = element.cloneNode(true) as Element;
  copy.querySelectorAll('.sr-only').forEach((node) => node.remove());
  return copy.textContent ?? '';
}

afterEach(() => cleanup());

describe('Pitch & size reckoner page', () => {
  it('shows a voice flute at a′ = 415 Hz sounding D4 at 276.98 Hz, C♯4 −1.3 cents at modern pitch', async () => {
    const router = renderReckoner();
    const sounding = region('Sounding pitch');

    fireEvent.change(within(sounding).getByLabelText('Size'), { target: { value: 'voice-flute' } });
    const pick = within(sounding).getByRole('button', { name: /415 Hz/ });
    fireEvent.click(pick);

    await waitFor(() => expect(sounding.textContent).toContain('276.98 Hz'));
    expect(pick.getAttribute('aria-pressed')).toBe('true');
    const text = visibleText(sounding);
    expect(text).toContain('D4');
    // Common practice: at a′ = 415 Hz a D-nominal size sounds about a C♯ at modern pitch.
    expect(text).toMatch(/C[♯#]4\s*−1\.3 cents/);
    expect(text).toContain('−101.3 cents');
    expect(within(sounding).getByRole('link', { name: /\/api\/reckon\/sounding\?size=voice-flute&a=415/ })).toBeTruthy();
    await waitFor(() => expect(router.state.location.search).toContain('size=voice-flute'));
    expect(router.state.location.search).toContain('a=415');
  });

  it('resolves "a fourth below the alto" to the size the shared parser returns', async () => {
    renderReckoner();
    const relative = region('Relative size');
    const expected = resolveSizeDescription('a fourth below the alto');

    fireEvent.change(within(relative).getByLabelText('Description'), { target: { value: 'a fourth below the alto' } });

    await waitFor(() => expect(relative.textContent).toContain(expected.size.name));
    expect(relative.textContent).toContain('perfect fourth below');
  });

  it('shows the shared error for a′ = 600 Hz beside the field', async () => {
    renderReckoner('?size=alto&a=415');
    const field = screen.getByLabelText('a′ (Hz)');
    let message = '';
    try {
      validateA4(600);
    } catch (error) {
      message = (error as ReckonerError).message;
    }
    expect(message).not.toBe('');

    fireEvent.change(field, { target: { value: '600' } });

    await waitFor(() => expect(field.getAttribute('aria-invalid')).toBe('true'));
    const described = (field.getAttribute('aria-describedby') ?? '').split(' ').map((id) => document.getElementById(id)?.textContent ?? '');
    expect(described.join(' ')).toContain(message);
    expect(visibleText(region('Sounding pitch'))).not.toContain('Frequency');
  });

  it('lists F major on every size with the voice flute’s F-fingering key from the shared function', async () => {
    renderReckoner('?a=415');
    const piece = region('Piece on every size');

    fireEvent.change(within(piece).getByLabelText('Sounding key'), { target: { value: 'F major' } });
    const table = await within(piece).findByRole('table');

    const voiceFlute = within(table).getByRole('rowheader', { name: /Voice flute/ }).closest('tr')!;
    const cells = within(voiceFlute).getAllByRole('cell');
    const expected = fingeringKey('voice-flute', 'F major', 'F');
    expect(ascii(cells[1].textContent)).toContain(expected.fingeringKey);
    expect(cells[1].textContent).toContain(`${-expected.keySignature}♭`);
    // Common practice: with F-fingering a D-size player adds three flats to the signature.
    expect(expected.keySignature - expected.soundingKeySignature).toBe(-3);
    if (expected.keySignature <= -4) expect(cells[1].textContent).toContain('cross-fingered');
    expect(within(table).getAllByRole('row')).toHaveLength(1 + 9);
  });

  it('marks the sizes whose range fits with a label, not colour alone', async () => {
    renderReckoner('?key=F%20major&lowest=F4&highest=D6&a=415');
    const table = await within(region('Piece on every size')).findByRole('table');
    const alto = within(table).getByRole('rowheader', { name: /Alto recorder/ }).closest('tr')!;
    const bass = within(table).getByRole('rowheader', { name: /^Bass recorder/ }).closest('tr')!;
    expect(alto.textContent).toContain('fits');
    expect(bass.textContent).toMatch(/semitones? too high/);
  });

  it('reads a double-dated day and reckons it from the year beginning on 25 March', async () => {
    renderReckoner();
    const date = region('Historical date');
    fireEvent.change(within(date).getByLabelText('As written'), { target: { value: '10 February 1700/01' } });
    fireEvent.click(await within(date).findByRole('button', { name: /Reckon 1700-02-10/ }));

    await waitFor(() => expect(date.textContent).toContain('10 February 1701'));
    expect((within(date).getByLabelText('Year begins on') as HTMLSelectElement).value).toBe('mar25');
    expect(date.textContent).toContain('1701-02-10');
  });
});
