import { useId, useState, type FormEvent } from 'react';
import { reviewDecisions, type ReviewDecision } from '@shared/catalogue/vocabulary';
import { decisionNeedsComment } from '@shared/catalogue/workflow';
import { fieldLabel } from '@shared/review/fields';
import type { EntityKind, FieldComment } from '@shared/review/types';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';

const choices: Record<ReviewDecision, { label: string; hint: string }> = {
  approve: { label: 'Approve', hint: 'Publish this version.' },
  return: { label: 'Return for changes', hint: 'The contributor fixes it and submits again.' },
  reject: { label: 'Reject', hint: 'It will not be published; the contributor may reopen it as a draft.' },
};

export interface DecisionFormProps {
  kind: EntityKind;
  fieldComments: FieldComment[];
  onFieldCommentsChange: (comments: FieldComment[]) => void;
  pending: boolean;
  error: unknown;
  onDecide: (decision: ReviewDecision, comment: string) => void;
}

/** The decision, with a comment required when returning or rejecting, and the comments anchored to fields. */
export function DecisionForm({ kind, fieldComments, onFieldCommentsChange, pending, error, onDecide }: DecisionFormProps) {
  const [decision, setDecision] = useState<ReviewDecision | ''>('');
  const [comment, setComment] = useState('');
  const [missing, setMissing] = useState(false);
  const commentId = useId();
  const needsComment = decision !== '' && decisionNeedsComment(decision);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!decision) return;
    if (needsComment && !comment.trim()) {
      setMissing(true);
      document.getElementById(commentId)?.focus();
      return;
    }
    onDecide(decision, comment.trim());
  };

  return (
    <form onSubmit={submit} aria-label="Decision" className="space-y-4 rounded-soft border border-rule-strong bg-paper-raised p-4">
      <FormError error={error} title="The decision was not recorded" fieldLabels={{ comment: 'Comment' }} fieldIds={{ comment: commentId }} />
      <fieldset>
        <legend className="mb-2 font-semibold">Decision</legend>
        {reviewDecisions.map((d) => (
          <label key={d} className="mb-1 flex items-start gap-2">
            <input type="radio" name="decision" value={d} checked={decision === d} onChange={() => setDecision(d)} className="mt-1 accent-accent" />
            <span>
              {choices[d].label} <span className="block text-sm text-ink-muted">{choices[d].hint}</span>
            </span>
          </label>
        ))}
      </fieldset>
      <div>
        <label htmlFor={commentId} className="block text-sm font-medium">
          Comment to the contributor {needsComment ? <span>(required)</span> : <span className="font-normal text-ink-muted">(optional)</span>}
        </label>
        <textarea
          id={commentId}
          rows={4}
          className="field-control mt-1"
          value={comment}
          aria-invalid={missing && !comment.trim() ? true : undefined}
          aria-describedby={missing && !comment.trim() ? `${commentId}-error` : undefined}
          onChange={(e) => setComment(e.target.value)}
        />
        {missing && needsComment && !comment.trim() && (
          <p id={`${commentId}-error`} className="mt-1 text-sm font-medium text-danger">
            <span aria-hidden="true">✕ </span>Say what to change: a comment is required to {decision === 'reject' ? 'reject' : 'return'}.
          </p>
        )}
      </div>
      {fieldComments.length > 0 && (
        <div>
          <p className="text-sm font-medium">Comments on fields</p>
          <ul className="mt-1 space-y-2">
            {fieldComments.map((c, i) => (
              <li key={i} className="flex flex-col gap-1">
                <label className="text-sm" htmlFor={`${commentId}-f${i}`}>
                  <a href={`#field-${c.field}`}>{fieldLabel(kind, c.field)}</a>
                </label>
                <div className="flex gap-2">
                  <input
                    id={`${commentId}-f${i}`}
                    className="field-control"
                    value={c.comment}
                    onChange={(e) => onFieldCommentsChange(fieldComments.map((x, j) => (j === i ? { ...x, comment: e.target.value } : x)))}
                  />
                  <Button variant="quiet" size="sm" onClick={() => onFieldCommentsChange(fieldComments.filter((_, j) => j !== i))}>
                    Remove<span className="sr-only"> the comment on {fieldLabel(kind, c.field)}</span>
                  </Button>
                </div>
              </li>
            ))}
          </ul>
        </div>
      )}
      <Button type="submit" loading={pending} disabled={!decision}>
        {decision ? `${choices[decision].label}` : 'Choose a decision'}
      </Button>
    </form>
  );
}
