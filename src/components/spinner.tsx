import { cn } from '@/lib/cn';

export interface SpinnerProps {
  /** Announced to screen readers; pass '' when the surrounding text already says it. */
  label?: string;
  size?: 'sm' | 'md' | 'lg';
  className?: string;
}

const sizes = { sm: 'size-3.5 border-2', md: 'size-5 border-2', lg: 'size-8 border-[3px]' };

export function Spinner({ label = 'Loading…', size = 'md', className }: SpinnerProps) {
  return (
    <span role={label ? 'status' : undefined} className={cn('inline-flex items-center gap-2', className)}>
      <span
        aria-hidden="true"
        className={cn('inline-block animate-spin rounded-full border-current border-r-transparent', sizes[size])}
      />
      {label && <span className="sr-only">{label}</span>}
    </span>
  );
}

/** A centred spinner for a whole page or panel. */
export function PageSpinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <div className="flex min-h-40 items-center justify-center text-ink-muted">
      <Spinner size="lg" label={label} />
    </div>
  );
}
