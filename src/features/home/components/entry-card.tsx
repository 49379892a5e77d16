import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

export interface EntryCardProps {
  to: string;
  title: string;
  children: ReactNode;
}

/** A way into one part of Windway; the whole card is one link, named by its title. */
export function EntryCard({ to, title, children }: EntryCardProps) {
  return (
    <li className="relative rounded-soft border border-rule bg-paper-raised p-5 shadow-leaf focus-within:border-accent hover:border-rule-strong">
      <h2 className="font-serif text-xl font-medium">
        <Link to={to} className="text-ink no-underline after:absolute after:inset-0 hover:text-accent-strong">
          {title}
        </Link>
      </h2>
      <p className="mt-2 text-[0.9375rem] text-ink-muted">{children}</p>
    </li>
  );
}
