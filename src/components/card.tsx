import { useId, type ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface CardProps {
  /** Rendered as a heading at the given level (default h2) and used to label the section. */
  title?: ReactNode;
  headingLevel?: 2 | 3 | 4;
  children?: ReactNode;
  footer?: ReactNode;
  className?: string;
  /** `section` when the card has a title and stands for a part of the page. */
  as?: 'div' | 'section' | 'article';
}

export function Card({ title, headingLevel = 2, children, footer, className, as }: CardProps) {
  const Tag = as ?? (title ? 'section' : 'div');
  const Heading = `h${headingLevel}` as 'h2' | 'h3' | 'h4';
  const headingId = useId();
  return (
    <Tag
      className={cn('rounded-soft border border-rule bg-paper-raised p-5 shadow-leaf', className)}
      aria-labelledby={title && Tag !== 'div' ? headingId : undefined}
    >
      {title && (
        <Heading id={headingId} className="mb-3 font-serif text-xl font-medium text-ink">
          {title}
        </Heading>
      )}
      {children}
      {footer && <div className="mt-4 border-t border-rule pt-3">{footer}</div>}
    </Tag>
  );
}
