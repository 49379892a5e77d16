import type { WorkflowState } from './vocabulary';

/**
 * The one state machine of sources and excerpts. Routes ask `transition()` for the
 * next state; who may take a step is the policies' business (server/policies).
 */
export const workflowActions = ['submit', 'withdraw', 'reopen', 'approve', 'return', 'reject'] as const;
export type WorkflowAction = (typeof workflowActions)[number];

const table: Record<WorkflowAction, { from: readonly WorkflowState[]; to: WorkflowState }> = {
  submit: { from: ['draft', 'returned'], to: 'submitted' },
  withdraw: { from: ['draft', 'submitted', 'returned'], to: 'withdrawn' },
  reopen: { from: ['withdrawn', 'rejected'], to: 'draft' },
  approve: { from: ['submitted'], to: 'approved' },
  return: { from: ['submitted'], to: 'returned' },
  reject: { from: ['submitted'], to: 'rejected' },
};

export const transitions = table;

/** The next state, or null when the action is not possible from `state`. */
export function transition(state: WorkflowState, action: WorkflowAction): WorkflowState | null {
  const rule = table[action];
  return rule.from.includes(state) ? rule.to : null;
}

/** Contributors edit drafts and returned items; editing approved material starts a new version for review. */
export function isEditable(state: WorkflowState): boolean {
  return state === 'draft' || state === 'returned' || state === 'approved';
}

export const decisionNeedsComment = (action: WorkflowAction) => action === 'return' || action === 'reject';

export const stateLabels: Record<WorkflowState, string> = {
  draft: 'Draft',
  submitted: 'Awaiting review',
  approved: 'Approved',
  returned: 'Returned for changes',
  rejected: 'Rejected',
  withdrawn: 'Withdrawn',
};
