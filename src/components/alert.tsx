import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export type AlertTone = 'info' | 'success' | 'caution' | 'danger';

const tones: Record<AlertTone, { box: string; word: string }> = {
  info: { box: 'border-rule-strong bg-paper-raised', word: 'Note' },
  success: { box: 'border-accent bg-accent-soft', word: 'Done' },
  caution: { box: 'border-caution bg-caution-soft', word: 'Take care' },
  danger: { box: 'border-danger bg-danger-soft', word: 'Problem' },
};

export interface AlertProps {
  tone?: AlertTone;
  /** Heading of the message; defaults to a word for the tone so colour is never the only cue. */
  title?: ReactNode;
  children?: ReactNode;
  /** Extra controls such as a retry button. */
  action?: ReactNode;
  /** `alert` interrupts a screen reader; use it for errors that follow an action. */
  role?: 'alert' | 'status' | 'none';
  className?: string;
  id?: string;
}

export function Alert({ tone = 'info', title, children, action, role, className, id }: AlertProps) {
  const resolvedRole = role ?? (tone === 'danger' ? 'alert' : 'status');
  return (
    <div
      id={id}
      role={resolvedRole === 'none' ? undefined : resolvedRole}
      className={cn('rounded-soft border-l-4 border px-4 py-3 text-[0.9375rem]', tones[tone].box, className)}
    >
      <p className="font-semibold text-ink">{title ?? tones[tone].word}</p>
      {children && <div className="mt-1 text-ink">{children}</div>}
      {action && <div className="mt-3">{action}</div>}
    </div>
  );
}
