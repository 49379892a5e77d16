import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider, useLocation } from 'react-router-dom';
import type { Role } from '@shared/schemas/auth';
import { RequireRole } from '@/features/auth/components/require-role';
import { clearCsrfToken } from '@/lib/api';
import { buildSession, createTestQueryClient, json, stubFetch, withQueryClient } from './support';

function SignInProbe() {
  const location = useLocation();
  return <p>Sign-in page at {location.pathname + location.search}</p>;
}

function renderAt(path: string, role: Role | null) {
  stubFetch(() => json(buildSession(role)));
  const router = createMemoryRouter(
    [
      { path: '/sign-in', element: <SignInProbe /> },
      {
        path: '/review',
        element: <RequireRole roles={['editor', 'admin']} section="Review" />,
        children: [{ index: true, element: <h1>Review queue</h1> }],
      },
    ],
    { initialEntries: [path] },
  );
  const Wrapper = withQueryClient(createTestQueryClient());
  render(
    <Wrapper>
      <RouterProvider router={router} />
    </Wrapper>,
  );
}

beforeEach(() => clearCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('RequireRole', () => {
  it('sends anonymous visitors to sign-in with the return path', async () => {
    renderAt('/review?status=submitted', null);
    expect(await screen.findByText('Sign-in page at /sign-in?next=%2Freview%3Fstatus%3Dsubmitted')).toBeTruthy();
  });

  it('tells a reader that Review is not open to them', async () => {
    renderAt('/review', 'reader');
    expect(await screen.findByRole('heading', { name: 'Review is not open to you' })).toBeTruthy();
    expect(screen.queryByText('Review queue')).toBeNull();
  });

  it('lets an editor in', async () => {
    renderAt('/review', 'editor');
    expect(await screen.findByRole('heading', { name: 'Review queue' })).toBeTruthy();
  });
});
