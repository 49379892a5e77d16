import { stateLabels } from '@shared/catalogue/workflow';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { cn } from '@/lib/cn';

/** Each state has its own mark as well as its words, so colour never carries the meaning alone. */
const looks: Record<WorkflowState, { mark: string; box: string }> = {
  draft: { mark: '○', box: 'border-rule-strong text-ink-muted' },
  submitted: { mark: '◔', box: 'border-caution text-caution' },
  approved: { mark: '●', box: 'border-accent text-accent-strong bg-accent-soft' },
  returned: { mark: '↩', box: 'border-caution text-caution bg-caution-soft' },
  rejected: { mark: '✕', box: 'border-danger text-danger' },
  withdrawn: { mark: '–', box: 'border-rule text-ink-faint' },
};

export function StatusBadge({ status, className }: { status: WorkflowState; className?: string }) {
  const look = looks[status];
  return (
    <span className={cn('inline-flex items-center gap-1 whitespace-nowrap rounded-full border px-2 py-0.5 text-xs font-medium', look.box, className)}>
      <span aria-hidden="true">{look.mark}</span>
      <span>{stateLabels[status]}</span>
    </span>
  );
}
