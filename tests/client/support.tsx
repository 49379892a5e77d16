import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { vi } from 'vitest';
import type { PublicUser, Role, SessionResponse } from '@shared/schemas/auth';

export interface RecordedCall {
  url: string;
  method: string;
  headers: Headers;
  body: unknown;
}

type Responder = (call: RecordedCall) => Response | Promise<Response>;

export function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** Replace globalThis.fetch with a responder; returns the calls it received, in order. */
export function stubFetch(respond: Responder): RecordedCall[] {
  const calls: RecordedCall[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
      const call: RecordedCall = {
        url: String(input),
        method: (init.method ?? 'GET').toUpperCase(),
        headers: new Headers(init.headers),
        body: typeof init.body === 'string' ? JSON.parse(init.body) : init.body,
      };
      calls.push(call);
      return respond(call);
    }),
  );
  return calls;
}

export function buildUser(overrides: Partial<PublicUser> = {}): PublicUser {
  return {
    id: 7,
    email: 'hester.vale@example.org',
    displayName: 'Hester Vale',
    role: 'reader',
    active: true,
    emailVerifiedAt: '2025-01-10T09:00:00.000Z',
    createdAt: '2025-01-09T09:00:00.000Z',
    ...overrides,
  };
}

export function buildSession(role: Role | null, overrides: Partial<SessionResponse> = {}): SessionResponse {
  return {
    user: role ? buildUser({ role }) : null,
    csrfToken: 'token-from-me',
    demo: false,
    mailCapture: false,
    ...overrides,
  };
}

export function createTestQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
}

export function withQueryClient(client: QueryClient) {
  return function Wrapper({ children }: { children: ReactNode }) {
    return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  };
}
