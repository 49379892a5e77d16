import { Link, useLocation, useParams } from 'react-router-dom';
import type { EntityKind } from '@shared/review/types';
import { Alert } from '@/components/alert';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { formatDate } from '@/lib/format';
import { useVersion } from '../api/get-version';
import { SnapshotFields } from '../components/snapshot-fields';

/**
 * The permalink of one version (`/sources/:id/v/:version`, `/excerpts/:id/v/:version`):
 * read-only, as it was, which citations can name.
 */
export function Component() {
  const { id = '', version = '1' } = useParams();
  const kind: EntityKind = useLocation().pathname.startsWith('/sources/') ? 'source' : 'excerpt';
  const query = useVersion(kind, id, Number(version));

  if (query.isPending) return <PageSpinner label="Loading the version…" />;
  if (query.isError) return <Alert tone="danger" title="This version could not be shown">{errorMessage(query.error)}</Alert>;
  const v = query.data.data;
  const latest = v.version === v.currentVersion;
  return (
    <>
      <div role="note" className="mb-6 rounded-soft border border-l-4 border-rule-strong bg-paper-sunk px-4 py-3">
        <p className="font-semibold">
          Version <span className="figures">{v.version}</span> of “{v.title}”, as of <span className="figures">{formatDate(v.createdAt)}</span>
        </p>
        <p className="text-sm text-ink-muted">
          {latest ? 'This is the latest version.' : `A later version (${v.currentVersion}) exists.`} This page never changes, so it can be cited.{' '}
          <Link to={`/history/${kind}/${id}`}>All versions</Link> · <Link to={`/${kind}s/${id}`}>Current page</Link>
        </p>
      </div>
      <PageHeader eyebrow={kind === 'source' ? 'Source' : 'Excerpt'} title={v.title} description={v.reason ? `Saved by ${v.author?.displayName ?? 'unknown'}: ${v.reason}` : undefined} />
      <SnapshotFields kind={kind} snapshot={v.snapshot} />
    </>
  );
}
