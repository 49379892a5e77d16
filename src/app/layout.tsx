import { useEffect, useRef } from 'react';
import { Link, Outlet, useLocation, useNavigation } from 'react-router-dom';
import { Button } from '@/components/button';
import { useSession } from '@/features/auth/api/get-session';
import { AccountMenu } from './account-menu';
import { DemoNotice } from './demo-notice';
import { MainNav } from './main-nav';
import { Wordmark } from './wordmark';

/** Moves focus to <main> after client-side navigation, so screen readers start at the new page. */
function useFocusMainOnNavigate() {
  const mainRef = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  // Compared with the previous path (not a "first render" flag, which StrictMode's double effects defeat).
  const previous = useRef(pathname);
  useEffect(() => {
    if (previous.current === pathname) return;
    previous.current = pathname;
    mainRef.current?.focus({ preventScroll: false });
  }, [pathname]);
  return mainRef;
}

function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div className="fixed inset-x-0 top-0 z-50 h-0.5 overflow-hidden bg-accent-soft" role="status">
      <div className="h-full w-1/3 animate-pulse bg-accent" />
      <span className="sr-only">Loading page…</span>
    </div>
  );
}

/** The shell around every page: header, role-aware navigation, main landmark, footer. */
export function Layout() {
  const session = useSession();
  const mainRef = useFocusMainOnNavigate();

  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        data-skip-link
        className="sr-only focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:z-50 focus:rounded-soft focus:bg-paper-raised focus:px-4 focus:py-2 focus:shadow-leaf"
      >
        Skip to content
      </a>
      <NavigationProgress />
      {session.demo && <DemoNotice />}
      <header role="banner" className="border-b border-rule bg-paper">
        <div className="mx-auto flex max-w-page flex-wrap items-center justify-between gap-x-8 gap-y-2 px-4 pt-3 pb-2 sm:px-6 md:pb-0">
          <Wordmark />
          <div className="ml-auto">
            <AccountMenu user={session.user} pending={session.isPending} />
          </div>
          <MainNav role={session.role} />
        </div>
      </header>
      {session.isError && (
        <div role="status" className="border-b border-caution/40 bg-caution-soft">
          <div className="mx-auto flex max-w-page flex-wrap items-center gap-3 px-4 py-2 text-sm sm:px-6">
            <span>
              <strong>Offline or unavailable:</strong> your account could not be checked, so signed-in sections are
              hidden.
            </span>
            <Button size="sm" variant="secondary" onClick={() => void session.refetch()}>
              Try again
            </Button>
          </div>
        </div>
      )}
      <main id="main" ref={mainRef} tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-4 py-8 outline-none sm:px-6 sm:py-10">
        <Outlet />
      </main>
      <footer role="contentinfo" className="border-t border-rule bg-paper-sunk/60">
        <div className="mx-auto flex max-w-page flex-col gap-2 px-4 py-6 text-sm text-ink-muted sm:flex-row sm:justify-between sm:px-6">
          <p>
            <span className="font-serif text-base text-ink">Windway</span> — primary sources on historical woodwinds,
            contributed by researchers and checked by editors.
          </p>
          <ul className="flex flex-wrap gap-4">
            <li>
              <Link to="/sources">Sources</Link>
            </li>
            <li>
              <Link to="/api-docs">API</Link>
            </li>
          </ul>
        </div>
      </footer>
    </div>
  );
}
