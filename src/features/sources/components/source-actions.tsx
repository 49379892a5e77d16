import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { SourceAbilities, SourceDetail } from '@shared/catalogue/types';
import { Alert } from '@/components/alert';
import { Button, buttonClasses } from '@/components/button';
import { errorMessage, isApiError } from '@/lib/api';
import { useReopenSource } from '../api/reopen-source';
import { useSubmitSource } from '../api/submit-source';
import { useWithdrawSource } from '../api/withdraw-source';

export interface SourceActionsProps {
  source: SourceDetail;
  abilities: SourceAbilities;
}

/** The buttons the server's abilities allow, and the outcome of the workflow steps. */
export function SourceActions({ source, abilities }: SourceActionsProps) {
  const submit = useSubmitSource();
  const withdraw = useWithdrawSource();
  const reopen = useReopenSource();
  const [confirmingWithdraw, setConfirmingWithdraw] = useState(false);
  const [notice, setNotice] = useState('');

  const missing = isApiError(submit.error) && submit.error.fields ? Object.entries(submit.error.fields) : [];
  const failed = [submit, withdraw, reopen].find((m) => m.isError);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        {abilities.update && (
          <Link to={`/sources/${source.id}/edit`} className={buttonClasses('secondary')}>
            Edit source
          </Link>
        )}
        {abilities.addExcerpt && (
          <Link to={`/sources/${source.id}/excerpts/new`} className={buttonClasses('secondary')}>
            Add an excerpt
          </Link>
        )}
        {abilities.submit && (
          <Button
            loading={submit.isPending}
            onClick={() => {
              setNotice('');
              submit.mutate(source.id, {
                onSuccess: (r) =>
                  setNotice(`Submitted for review with ${r.submittedExcerpts.length} excerpt${r.submittedExcerpts.length === 1 ? '' : 's'}. Editors have been told.`),
              });
            }}
          >
            Submit for review
          </Button>
        )}
        {abilities.reopen && (
          <Button variant="secondary" loading={reopen.isPending} onClick={() => reopen.mutate(source.id, { onSuccess: () => setNotice('The source is a draft again.') })}>
            Reopen as draft
          </Button>
        )}
        {abilities.withdraw && !confirmingWithdraw && (
          <Button variant="danger" onClick={() => setConfirmingWithdraw(true)}>
            Withdraw
          </Button>
        )}
      </div>

      {confirmingWithdraw && (
        <Alert
          tone="caution"
          title="Withdraw this source?"
          action={
            <div className="flex gap-2">
              <Button
                variant="danger"
                loading={withdraw.isPending}
                onClick={() =>
                  withdraw.mutate(source.id, {
                    onSuccess: () => {
                      setConfirmingWithdraw(false);
                      setNotice('The source was withdrawn. You can reopen it later.');
                    },
                  })
                }
              >
                Yes, withdraw
              </Button>
              <Button variant="secondary" onClick={() => setConfirmingWithdraw(false)}>
                Keep it
              </Button>
            </div>
          }
        >
          It leaves the review queue and is hidden from readers. Nothing is deleted; you can reopen it.
        </Alert>
      )}

      <div aria-live="polite" className="text-sm text-accent-strong">
        {notice && `✓ ${notice}`}
      </div>

      {missing.length > 0 ? (
        <Alert tone="caution" title="Not ready for review yet" role="alert">
          <p>{submit.error instanceof Error ? submit.error.message : ''}</p>
          <ul className="mt-2 list-disc pl-5">
            {missing.map(([field, message]) => (
              <li key={field}>{message}</li>
            ))}
          </ul>
          {abilities.update && (
            <p className="mt-2">
              <Link to={`/sources/${source.id}/edit`}>Edit the source</Link> to fill in what is missing.
            </p>
          )}
        </Alert>
      ) : (
        failed && (
          <Alert tone="danger" title="That did not work">
            {errorMessage(failed.error)}
          </Alert>
        )
      )}
    </div>
  );
}
