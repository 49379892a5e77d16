import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface ReckonerSectionProps {
  /** Used for the section's id and its heading's id. */
  id: string;
  eyebrow: string;
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  className?: string;
}

/** One part of the reckoner: a region named by its heading. */
export function ReckonerSection({ id, eyebrow, title, intro, children, className }: ReckonerSectionProps) {
  const headingId = `${id}-heading`;
  return (
    <section
      id={id}
      aria-labelledby={headingId}
      className={cn('rounded-soft border border-rule bg-paper-raised p-5 shadow-leaf sm:p-6', className)}
    >
      <p className="label-caps text-ink-muted" aria-hidden="true">
        {eyebrow}
      </p>
      <h2 id={headingId} className="font-serif text-2xl font-medium leading-snug text-ink">
        {title}
      </h2>
      {intro && <p className="mt-1 max-w-reading text-ink-muted">{intro}</p>}
      <div className="mt-5">{children}</div>
    </section>
  );
}

/** Announces a short summary of the current result politely; the visible results stay quiet. */
export function LiveSummary({ children }: { children?: ReactNode }) {
  return (
    <p className="sr-only" aria-live="polite" aria-atomic="true">
      {children}
    </p>
  );
}

export interface Reading {
  term: ReactNode;
  detail: ReactNode;
  note?: ReactNode;
}

/** Results as a description list: a muted term, the figure, an optional gloss. */
export function Readings({ items, className }: { items: Reading[]; className?: string }) {
  return (
    <dl className={cn('grid grid-cols-1 gap-x-6 gap-y-3 sm:grid-cols-[minmax(9rem,auto)_1fr]', className)}>
      {items.map((item, index) => (
        <div key={index} className="contents">
          <dt className="text-sm font-medium text-ink-muted sm:pt-0.5">{item.term}</dt>
          <dd className="text-ink">
            <span className="figures text-lg">{item.detail}</span>
            {item.note && <span className="block text-sm text-ink-muted">{item.note}</span>}
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** The equivalent call of the public API, as a link a researcher can copy. */
export function ApiNote({ urls }: { urls: string[] }) {
  if (urls.length === 0) return null;
  return (
    <div className="mt-5 border-t border-rule pt-3 text-sm text-ink-muted">
      <p>
        <span className="label-caps mr-2">API</span>
        The same reckoning as JSON:
      </p>
      <ul className="mt-1 space-y-0.5">
        {urls.map((url) => (
          <li key={url} className="break-all">
            <a href={url}>
              <code className="font-mono text-[0.8125rem]">GET {url}</code>
            </a>
          </li>
        ))}
      </ul>
    </div>
  );
}
