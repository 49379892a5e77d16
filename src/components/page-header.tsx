import type { ReactNode } from 'react';

export interface PageHeaderProps {
  title: string;
  /** A short line above the title, e.g. the section name. */
  eyebrow?: ReactNode;
  description?: ReactNode;
  /** Buttons or links aligned to the end on wide screens. */
  actions?: ReactNode;
}

/** The page's h1; also sets the document title ("Title · Windway"). */
export function PageHeader({ title, eyebrow, description, actions }: PageHeaderProps) {
  return (
    <header className="mb-8 flex flex-col gap-4 border-b border-rule pb-6 sm:flex-row sm:items-end sm:justify-between">
      <title>{`${title} · Windway`}</title>
      <div>
        {eyebrow && <p className="label-caps text-ink-muted">{eyebrow}</p>}
        <h1 className="font-serif text-3xl font-medium leading-tight text-ink sm:text-4xl">{title}</h1>
        {description && <div className="mt-2 max-w-reading text-ink-muted">{description}</div>}
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </header>
  );
}
