import type { ReactNode } from 'react';

export interface EmptyStateProps {
  title: ReactNode;
  children?: ReactNode;
  /** A button or link that gets the person going. */
  action?: ReactNode;
}

export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="rounded-soft border border-dashed border-rule-strong px-6 py-10 text-center">
      <p className="font-serif text-xl text-ink">{title}</p>
      {children && <div className="mx-auto mt-2 max-w-prose text-ink-muted">{children}</div>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}
