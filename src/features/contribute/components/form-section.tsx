import type { ReactNode } from 'react';

export interface FormSectionProps {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  id?: string;
}

/** A titled group of fields: a fieldset whose legend screen readers announce with each field. */
export function FormSection({ title, description, children, id }: FormSectionProps) {
  return (
    <fieldset id={id} className="min-w-0 rounded-soft border border-rule bg-paper-raised px-5 pt-2 pb-5">
      <legend className="px-1 font-serif text-xl font-medium text-ink">{title}</legend>
      {description && <div className="mb-3 max-w-reading text-sm text-ink-muted">{description}</div>}
      <div className="space-y-4">{children}</div>
    </fieldset>
  );
}
