import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { PageSpinner } from '@/components/spinner';
import { RequireRole } from '@/features/auth/components/require-role';
import { adminRoles, contributorRoles, editorRoles } from '@/lib/roles';
import { Layout } from './layout';
import { RouteError } from './route-error';

/** A lazy route module that renders the "being built" page under the given title. */
function placeholder(title: string, description?: string): RouteObject['lazy'] {
  return async () => {
    const { PlaceholderPage } = await import('./placeholder-page');
    return { Component: () => <PlaceholderPage title={title} description={description} /> };
  };
}

/*
 * Every page is a lazy route module exporting `Component`:
 *   { path: 'sources', lazy: () => import('@/features/sources/routes/sources') }
 * Guards are layout routes: <RequireRole roles={...} /> renders its child routes.
 */
export const routes: RouteObject[] = [
  {
    path: '/',
    element: <Layout />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageSpinner />,
    children: [
      {
        // Errors in a page render inside the layout, so navigation stays usable.
        errorElement: <RouteError />,
        children: [
          { index: true, lazy: () => import('@/features/home/routes/home') },

          // ---- Account
          { path: 'sign-in', lazy: () => import('@/features/auth/routes/sign-in') },
          { path: 'register', lazy: () => import('@/features/auth/routes/register') },
          { path: 'forgot-password', lazy: () => import('@/features/auth/routes/forgot-password') },
          { path: 'reset-password', lazy: () => import('@/features/auth/routes/reset-password') },
          {
            element: <RequireRole section="Your account" />,
            children: [{ path: 'account', lazy: () => import('@/features/auth/routes/account') }],
          },

          // ---- Admin
          {
            path: 'admin',
            element: <RequireRole roles={adminRoles} section="Admin" />,
            children: [
              { index: true, lazy: () => import('@/features/admin/routes/admin-home') },
              { path: 'users', lazy: () => import('@/features/admin/routes/users') },
              { path: 'outbox', lazy: () => import('@/features/admin/routes/outbox') },
              { path: 'reindex', lazy: () => import('@/features/admin/routes/reindex') },
            ],
          },

          // ======== SECTIONS BUILT BY OTHER ENGINEERS — swap `placeholder(...)` for your route module ========
          // e.g. { index: true, lazy: () => import('@/features/search/routes/search') }
          // Add sub-pages (e.g. { path: ':id/edit', lazy: ... }) next to the index route. Keep the guards.
          { path: 'search', children: [{ index: true, lazy: () => import('@/features/search/routes/search') }] },
          {
            path: 'sources',
            children: [
              { index: true, lazy: () => import('@/features/sources/routes/sources') },
              { path: ':id', lazy: () => import('@/features/sources/routes/source') },
              { path: ':id/v/:version', lazy: () => import('@/features/history/routes/version') },
              {
                element: <RequireRole roles={contributorRoles} section="Contribute" />,
                children: [
                  { path: ':id/edit', lazy: () => import('@/features/sources/routes/edit-source') },
                  { path: ':id/excerpts/new', lazy: () => import('@/features/excerpts/routes/new-excerpt') },
                ],
              },
            ],
          },
          {
            path: 'excerpts',
            children: [
              { path: ':id', lazy: () => import('@/features/excerpts/routes/excerpt') },
              { path: ':id/v/:version', lazy: () => import('@/features/history/routes/version') },
              {
                element: <RequireRole roles={contributorRoles} section="Contribute" />,
                children: [{ path: ':id/edit', lazy: () => import('@/features/excerpts/routes/edit-excerpt') }],
              },
            ],
          },
          { path: 'concordance', children: [{ index: true, lazy: () => import('@/features/concordance/routes/concordance') }] },
          { path: 'history/:kind/:id', lazy: () => import('@/features/history/routes/history') },
          { path: 'reckoner', children: [{ index: true, lazy: () => import('@/features/reckoner/routes/reckoner') }] },
          { path: 'api-docs', lazy: () => import('@/features/api-docs/routes/api-docs') },
          {
            path: 'programmes',
            element: <RequireRole section="Programmes" />,
            children: [{ index: true, lazy: () => import('@/features/programmes/routes/programmes') }, { path: ':id', lazy: () => import('@/features/programmes/routes/programme') }],
          },
          {
            path: 'contribute',
            element: <RequireRole roles={contributorRoles} section="Contribute" />,
            children: [{ index: true, lazy: () => import('@/features/contribute/routes/contribute') }],
          },
          {
            path: 'submissions',
            element: <RequireRole roles={contributorRoles} section="My submissions" />,
            children: [{ index: true, lazy: () => import('@/features/submissions/routes/submissions') }, { path: ':kind/:id', lazy: () => import('@/features/submissions/routes/submission') }],
          },
          {
            path: 'review',
            element: <RequireRole roles={editorRoles} section="Review" />,
            children: [{ index: true, lazy: () => import('@/features/review/routes/queue') }, { path: ':kind/:id', lazy: () => import('@/features/review/routes/review') }],
          },
          // ======== END OF SECTIONS BUILT BY OTHER ENGINEERS ========

          { path: 'p/:shareToken', lazy: () => import('@/features/programmes/routes/shared-programme') },
          { path: 'import', element: <RequireRole roles={contributorRoles} section="Import sources" />, children: [{ index: true, lazy: () => import('@/features/import/routes/import') }] },
          { path: '*', lazy: () => import('./not-found-page') },
        ],
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
