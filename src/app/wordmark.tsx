import { Link } from 'react-router-dom';

/** Windway's mark: a block and the narrow channel above it that shapes the breath. */
export function Wordmark() {
  return (
    <Link to="/" className="group flex items-center gap-2 text-ink no-underline" aria-label="Windway, home">
      <svg aria-hidden="true" viewBox="0 0 28 28" className="size-7 text-accent">
        <rect x="3" y="4" width="22" height="20" rx="3" fill="none" stroke="currentColor" strokeWidth="1.6" />
        <path d="M3 11.5 H17" stroke="currentColor" strokeWidth="1.6" />
        <path d="M17 11.5 L25 8.5" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
        <rect x="5.5" y="13.5" width="11" height="8" rx="1.2" fill="currentColor" opacity="0.25" />
      </svg>
      <span className="font-serif text-2xl font-medium leading-none tracking-wide group-hover:text-accent-strong">
        Windway
      </span>
    </Link>
  );
}
