import { useEffect, useId, useRef, useState } from 'react';
import { NavLink, useLocation } from 'react-router-dom';
import type { Role } from '@shared/schemas/auth';
import { cn } from '@/lib/cn';
import { visibleNav } from './navigation';

const linkClass = ({ isActive }: { isActive: boolean }) =>
  cn(
    'block border-b-2 px-1 py-2 text-[0.9375rem] font-medium no-underline md:pb-2 md:pt-1.5',
    isActive ? 'border-accent text-ink' : 'border-transparent text-ink-muted hover:border-rule-strong hover:text-ink',
  );

/** The role-aware main navigation; below the md breakpoint it folds behind a "Menu" button. */
export function MainNav({ role }: { role: Role | null }) {
  const [open, setOpen] = useState(false);
  const listId = useId();
  const buttonRef = useRef<HTMLButtonElement>(null);
  const { pathname } = useLocation();
  const items = visibleNav(role);

  useEffect(() => setOpen(false), [pathname]);

  return (
    <nav
      aria-label="Main"
      className="order-last w-full"
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
        aria-controls={listId}
        onClick={() => setOpen((v) => !v)}
        className="flex items-center gap-2 rounded-soft border border-rule-strong px-3 py-1.5 text-sm font-medium md:hidden"
      >
        <span aria-hidden="true" className="inline-flex w-4 flex-col gap-[3px]">
          <span className="h-px bg-current" />
          <span className="h-px bg-current" />
          <span className="h-px bg-current" />
        </span>
        {open ? 'Close menu' : 'Menu'}
      </button>
      <ul
        id={listId}
        className={cn(
          'mt-2 flex-col gap-1 border-t border-rule pt-2 md:mt-0 md:flex md:flex-row md:flex-wrap md:gap-x-6 md:pt-1',
          open ? 'flex' : 'hidden',
        )}
      >
        {items.map((item) => (
          <li key={item.to}>
            <NavLink to={item.to} className={linkClass} title={item.title} aria-label={item.title}>
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
