import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { clearCsrfToken } from '@/lib/api';
import { buildUser, createTestQueryClient, json, stubFetch, withQueryClient } from './support';

function renderForm(onSuccess = vi.fn()) {
  const Wrapper = withQueryClient(createTestQueryClient());
  render(
    <Wrapper>
      <MemoryRouter>
        <SignInForm onSuccess={onSuccess} />
      </MemoryRouter>
    </Wrapper>,
  );
  return onSuccess;
}

beforeEach(() => clearCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('SignInForm', () => {
  it('shows validation messages tied to the empty fields and sends nothing', async () => {
    const calls = stubFetch(() => json({}));
    renderForm();

    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText('E-mail address');
    const password = screen.getByLabelText('Password');
    await waitFor(() => expect(email.getAttribute('aria-invalid')).toBe('true'));
    expect(password.getAttribute('aria-invalid')).toBe('true');

    const emailError = document.getElementById(email.getAttribute('aria-describedby') ?? '');
    const passwordError = document.getElementById(password.getAttribute('aria-describedby') ?? '');
    expect(emailError?.textContent).toContain('Enter your e-mail address');
    expect(passwordError?.textContent).toContain('Enter your password');
    expect(calls).toHaveLength(0);
  });

  it('asks for a well-formed e-mail address', async () => {
    stubFetch(() => json({}));
    renderForm();

    fireEvent.input(screen.getByLabelText('E-mail address'), { target: { value: 'hester at example' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'a long phrase of mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText(/Enter an e-mail address such as/)).toBeTruthy();
  });

  it('explains wrong credentials after a 401', async () => {
    stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : json({ error: { code: 'unauthenticated', message: 'Wrong e-mail or password' } }, 401),
    );
    const onSuccess = renderForm();

    fireEvent.input(screen.getByLabelText('E-mail address'), { target: { value: 'hester@example.org' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'not my password' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('do not match an account');
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('signs in with the CSRF token and reports the user', async () => {
    const user = buildUser();
    const calls = stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : json({ user, csrfToken: 't2' }),
    );
    const onSuccess = renderForm();

    fireEvent.input(screen.getByLabelText('E-mail address'), { target: { value: ' Hester@Example.org ' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'a long phrase of mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSuccess).toHaveBeenCalledWith(user));
    const login = calls.find((c) => c.url === '/api/auth/login');
    expect(login?.body).toEqual({ email: 'hester@example.org', password: 'a long phrase of mine' });
    expect(login?.headers.get('X-CSRF-Token')).toBe('t1');
  });
});
