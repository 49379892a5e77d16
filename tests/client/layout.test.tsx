import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import type { Role } from '@shared/schemas/auth';
import { Layout } from '@/app/layout';
import { clearCsrfToken } from '@/lib/api';
import { buildSession, createTestQueryClient, json, stubFetch, withQueryClient } from './support';

function renderLayout(role: Role | null, overrides: Parameters<typeof buildSession>[1] = {}) {
  stubFetch((call) => (call.url === '/api/auth/me' ? json(buildSession(role, overrides)) : json({}, 404)));
  const router = createMemoryRouter(
    [{ path: '/', element: <Layout />, children: [{ index: true, element: <h1>Home page</h1> }] }],
    { initialEntries: ['/'] },
  );
  const Wrapper = withQueryClient(createTestQueryClient());
  render(
    <Wrapper>
      <RouterProvider router={router} />
    </Wrapper>,
  );
}

async function navLinkNames(): Promise<string[]> {
  const nav = screen.getByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent ?? '');
}

beforeEach(() => clearCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('Layout navigation', () => {
  it('hides Review, Contribute and Admin from a reader', async () => {
    renderLayout('reader');
    await screen.findByText('Hester Vale');

    const names = await navLinkNames();
    expect(names).toEqual(['Search', 'Sources', 'Concordance', 'Reckoner', 'Programmes']);
    expect(names).not.toContain('Review');
  });

  it('shows Review to an editor, but not Admin', async () => {
    renderLayout('editor');
    await screen.findByText('Hester Vale');

    const names = await navLinkNames();
    expect(names).toContain('Review');
    expect(names).toContain('Contribute');
    expect(names).toContain('My submissions');
    expect(names).not.toContain('Admin');
  });

  it('offers sign-in and register to anonymous visitors, with public sections only', async () => {
    renderLayout(null);
    expect(await screen.findByRole('link', { name: 'Sign in' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Register' })).toBeTruthy();
    expect(await navLinkNames()).toEqual(['Search', 'Sources', 'Concordance', 'Reckoner']);
  });

  it('shows the demo notice when /api/auth/me says demo', async () => {
    renderLayout('reader', { demo: true });
    const notice = await screen.findByRole('note', { name: 'Demo data' });
    expect(notice.textContent).toContain('Demo data: all sources, people and places here are fictional');
  });

  it('has a skip link to the main landmark', async () => {
    renderLayout(null);
    const skip = screen.getByRole('link', { name: 'Skip to content' });
    expect(skip.getAttribute('href')).toBe('#main');
    expect(screen.getByRole('main').id).toBe('main');
  });
});
