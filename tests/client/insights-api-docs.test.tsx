import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { Component as ApiDocsPage } from '@/features/api-docs/routes/api-docs';
import { createTestQueryClient, json, stubFetch } from './support';

const errorSchema = { type: 'object', required: ['error'], properties: { error: { type: 'object', required: ['code', 'message'] } } };
const answers = { '200': { description: 'Success' }, '4XX': { description: 'Bad input or not allowed: the error contract', content: { 'application/json': { schema: errorSchema } } } };

/** Shaped like what server/services/openapi generates. */
const openapi = {
  openapi: '3.1.0',
  info: { title: 'Windway API', version: '1.0.0' },
  paths: {
    '/api/insights': {
      get: {
        operationId: 'getApiInsights',
        parameters: [
          { name: 'size', in: 'query', required: false, schema: { anyOf: [{ type: 'string' }, { type: 'array', items: { type: 'string' } }] } },
          { name: 'scope', in: 'query', required: false, schema: { default: 'search', type: 'string', enum: ['search', 'public'] } },
        ],
        responses: answers,
      },
    },
    '/api/cite': {
      post: {
        operationId: 'postApiCite',
        parameters: [{ name: 'X-CSRF-Token', in: 'header', required: true, schema: { type: 'string' }, description: 'From GET /api/auth/me' }],
        requestBody: { required: true, content: { 'application/json': { schema: { type: 'object', properties: { ids: { type: 'array' } } } } } },
        responses: answers,
      },
    },
    '/api/sources/{id}/cite': { get: { operationId: 'getApiSourcesIdCite', parameters: [{ name: 'id', in: 'path', required: true, schema: { type: 'string' } }], responses: answers } },
    '/api/sources/{id}/tei': { get: { operationId: 'getApiSourcesIdTei', parameters: [{ name: 'id', in: 'path', required: true, schema: { type: 'string' } }], responses: answers } },
  },
};

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderPage() {
  stubFetch(() => json(openapi));
  const router = createMemoryRouter([{ path: '/api-docs', element: <ApiDocsPage /> }], { initialEntries: ['/api-docs'] });
  render(
    <QueryClientProvider client={createTestQueryClient()}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
}

describe('API page', () => {
  it('explains CSRF and the error contract, and groups the live endpoints by their first path segment', async () => {
    renderPage();
    expect(screen.getAllByText(/X-CSRF-Token/).length).toBeGreaterThan(0);
    await screen.findByText('4 endpoints in 3 groups.');
    const groups = within(screen.getByRole('navigation', { name: 'Endpoint groups' })).getAllByRole('link').map((a) => a.textContent);
    expect(groups).toEqual(['/cite (1)', '/insights (1)', '/sources (2)']);
    const sources = screen.getByRole('region', { name: '/sources' });
    expect(within(sources).getAllByText(/^\/api\/sources/).map((c) => c.textContent)).toEqual(['/api/sources/{id}/cite', '/api/sources/{id}/tei']);
  });

  it('shows parameters with place, requirement, type, allowed values and default, and the request body as JSON', async () => {
    renderPage();
    const insights = await screen.findByRole('region', { name: '/insights' });
    const params = within(insights).getByRole('region', { name: 'Parameters of GET /api/insights' });
    const rows = within(params).getAllByRole('row').slice(1).map((r) => r.textContent);
    expect(rows[0]).toBe('sizequeryoptionalstring | array of string—');
    expect(rows[1]).toBe('scopequeryoptionalstringone of: search, public"search"');
    const cite = screen.getByRole('region', { name: '/cite' });
    expect(within(cite).getByRole('region', { name: 'Request body of POST /api/cite' }).textContent).toContain('"ids": {');
    expect(within(cite).getByRole('link', { name: 'error contract' }).getAttribute('href')).toBe('#error-contract');
  });

  it('filters the endpoints as you type', async () => {
    renderPage();
    await screen.findByText('4 endpoints in 3 groups.');
    fireEvent.change(screen.getByLabelText('Find an endpoint'), { target: { value: 'cite' } });
    await waitFor(() => expect(screen.getByText('2 of 4 endpoints match.')).toBeTruthy());
    expect(screen.queryByRole('region', { name: '/insights' })).toBeNull();
    fireEvent.change(screen.getByLabelText('Find an endpoint'), { target: { value: 'post cite' } });
    await waitFor(() => expect(screen.getByText('1 of 4 endpoints match.')).toBeTruthy());
  });
});
