import { useEffect, useId, useRef, useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import type { PublicUser } from '@shared/schemas/auth';
import { buttonClasses } from '@/components/button';
import { Spinner } from '@/components/spinner';
import { useLogout } from '@/features/auth/api/logout';
import { roleLabels } from '@/lib/roles';
import { errorMessage } from '@/lib/api';

function SignedOutLinks() {
  const { pathname, search } = useLocation();
  const onAuthPage = /^\/(sign-in|register|forgot-password|reset-password)/.test(pathname);
  const next = onAuthPage || pathname === '/' ? '' : `?next=${encodeURIComponent(pathname + search)}`;
  return (
    <div className="flex items-center gap-3">
      <Link to={`/sign-in${next}`} className="text-sm font-medium">
        Sign in
      </Link>
      <Link to={`/register${next}`} className={buttonClasses('secondary', 'sm')}>
        Register
      </Link>
    </div>
  );
}

/** A disclosure (not an ARIA menu): a button that shows a small panel of links. */
function SignedInMenu({ user }: { user: PublicUser }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const { pathname } = useLocation();
  const logout = useLogout();

  useEffect(() => setOpen(false), [pathname]);
  useEffect(() => {
    if (!open) return;
    const onPointerDown = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', onPointerDown);
    return () => document.removeEventListener('pointerdown', onPointerDown);
  }, [open]);

  return (
    <div
      ref={rootRef}
      className="relative"
      onKeyDown={(event) => {
        if (event.key === 'Escape' && open) {
          setOpen(false);
          buttonRef.current?.focus();
        }
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((v) => !v)}
        className="flex max-w-[14rem] items-center gap-2 rounded-soft border border-rule px-3 py-1.5 text-left text-sm hover:bg-paper-sunk"
      >
        <span className="truncate font-medium">{user.displayName}</span>
        <span className="label-caps shrink-0 text-ink-muted">{roleLabels[user.role]}</span>
        <span aria-hidden="true" className="text-ink-muted">
          {open ? '▴' : '▾'}
        </span>
        <span className="sr-only">, account</span>
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="absolute right-0 z-20 mt-2 w-64 rounded-soft border border-rule bg-paper-raised p-3 shadow-leaf"
      >
        <p className="truncate text-sm text-ink-muted" title={user.email}>
          {user.email}
        </p>
        <ul className="mt-2 space-y-1 border-t border-rule pt-2 text-sm">
          <li>
            <Link to="/account" className="block rounded-soft px-2 py-1.5 no-underline hover:bg-paper-sunk">
              Account
            </Link>
          </li>
          <li>
            <button
              type="button"
              onClick={() => logout.mutate()}
              disabled={logout.isPending}
              className="flex w-full items-center gap-2 rounded-soft px-2 py-1.5 text-left text-accent-strong hover:bg-paper-sunk"
            >
              {logout.isPending && <Spinner size="sm" label="" />}
              Sign out
            </button>
          </li>
        </ul>
        {logout.isError && (
          <p role="alert" className="mt-2 text-sm text-danger">
            Not signed out: {errorMessage(logout.error)}
          </p>
        )}
      </div>
    </div>
  );
}

export function AccountMenu({ user, pending }: { user: PublicUser | null; pending: boolean }) {
  if (pending) return <Spinner size="sm" label="Checking your account…" className="text-ink-muted" />;
  return user ? <SignedInMenu user={user} /> : <SignedOutLinks />;
}
