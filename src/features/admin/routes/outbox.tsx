import { useState } from 'react';
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxMessage } from '@shared/review/types';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage, isApiError } from '@/lib/api';
import { api } from '@/lib/api';

export function getOutbox(signal?: AbortSignal) {
  return api.get<{ data: OutboxMessage[]; total: number }>('/api/admin/outbox', { signal });
}

export const outboxQueryOptions = () => queryOptions({ queryKey: ['admin', 'outbox'] as const, queryFn: ({ signal }) => getOutbox(signal), refetchInterval: 10_000 });

const time = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', second: '2-digit' });

function Message({ mail }: { mail: OutboxMessage }) {
  const [open, setOpen] = useState(false);
  const preview = mail.text.replace(/\s+/g, ' ').slice(0, 160);
  return (
    <li className="rounded-soft border border-rule bg-paper-raised p-4">
      <p className="font-medium">{mail.subject || '(no subject)'}</p>
      <p className="text-sm text-ink-muted">
        To {mail.to.join(', ')} · <time className="figures" dateTime={mail.receivedAt}>{time.format(new Date(mail.receivedAt))}</time>
      </p>
      {open ? <pre className="mt-2 whitespace-pre-wrap break-words font-sans text-[0.9375rem]">{mail.text}</pre> : <p className="mt-2 text-[0.9375rem]">{preview}{mail.text.length > 160 ? '…' : ''}</p>}
      <Button variant="quiet" size="sm" className="mt-1" aria-expanded={open} onClick={() => setOpen(!open)}>
        {open ? 'Show less' : 'Show the whole message'}
      </Button>
    </li>
  );
}

/** Outbox: the mail a local capture server received, newest first (only where mail is captured). */
export function Component() {
  const query = useQuery(outboxQueryOptions());
  return (
    <>
      <PageHeader eyebrow="Admin" title="Outbox" description="Mail this installation sent, as the local capture server received it: review notices, decisions, invitations, reset links." />
      {query.isPending ? (
        <PageSpinner label="Loading the outbox…" />
      ) : query.isError ? (
        isApiError(query.error) && query.error.status === 404 ? (
          <EmptyState title="Mail is not captured here">This installation sends mail through a real provider; there is no local outbox to show.</EmptyState>
        ) : (
          <Alert tone="danger" title="The outbox could not be loaded">{errorMessage(query.error)}</Alert>
        )
      ) : query.data.data.length === 0 ? (
        <EmptyState title="No mail yet">Messages appear here as soon as Windway sends them.</EmptyState>
      ) : (
        <>
          <p className="figures mb-3 text-sm text-ink-muted">{query.data.total} message{query.data.total === 1 ? '' : 's'}, newest first</p>
          <ul className="space-y-3">{query.data.data.map((m) => <Message key={m.id} mail={m} />)}</ul>
        </>
      )}
    </>
  );
}
