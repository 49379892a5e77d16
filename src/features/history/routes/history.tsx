import { useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { entityKinds, type EntityKind } from '@shared/review/types';
import { stateLabels } from '@shared/catalogue/workflow';
import { Alert } from '@/components/alert';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useHistory } from '../api/get-history';
import { useVersionDiff } from '../api/get-version-diff';
import { useRestoreVersion } from '../api/restore-version';
import { DiffView } from '../components/diff-view';
import { RestoreForm } from '../components/restore-form';
import { VersionsList } from '../components/versions-list';

export const versionPath = (kind: EntityKind, id: string, version: number) => `/${kind}s/${id}/v/${version}`;

/** History of a source or excerpt: every version, a diff between any two, restore for editors. */
export function Component() {
  const params = useParams();
  const kind = (entityKinds as readonly string[]).includes(params.kind ?? '') ? (params.kind as EntityKind) : 'excerpt';
  const id = params.id ?? '';
  const [search, setSearch] = useSearchParams();
  const history = useHistory(kind, id);
  const from = search.get('from') ? Number(search.get('from')) : undefined;
  const to = search.get('to') ? Number(search.get('to')) : undefined;
  const diff = useVersionDiff(kind, id, from, to, history.isSuccess);
  const restore = useRestoreVersion(kind, id);
  const [restoring, setRestoring] = useState<number | null>(null);
  const [notice, setNotice] = useState('');

  if (history.isPending) return <PageSpinner label="Loading the history…" />;
  if (history.isError) return <Alert tone="danger" title="The history could not be loaded">{errorMessage(history.error)}</Alert>;
  const { item, data: versions, abilities } = history.data;

  return (
    <>
      <PageHeader
        eyebrow={`History of ${kind === 'source' ? 'a source' : 'an excerpt'}`}
        title={item.title}
        description={
          <>
            Now at version <span className="figures">{item.version}</span> ({stateLabels[item.status]}).{' '}
            {!abilities.seesAllVersions && 'Only approved versions are shown.'}
          </>
        }
        actions={<Link to={versionPath(kind, id, item.approvedVersion ?? item.version)}>Read the {item.approvedVersion ? 'approved' : 'current'} version</Link>}
      />
      <div aria-live="polite" className="mb-3 min-h-6 text-sm text-accent-strong">{notice && `✓ ${notice}`}</div>
      <section aria-labelledby="versions-heading" className="mb-8">
        <h2 id="versions-heading" className="mb-3 font-serif text-2xl">Versions</h2>
        <VersionsList
          versions={versions}
          from={diff.data?.data.from ?? from}
          to={diff.data?.data.to ?? to}
          currentVersion={item.version}
          permalink={(v) => versionPath(kind, id, v)}
          onCompare={(f, t) => setSearch({ from: String(f), to: String(t) }, { replace: true })}
          onRestore={abilities.restore ? (v) => setRestoring(v) : undefined}
        />
        {restoring !== null && (
          <RestoreForm
            version={restoring}
            pending={restore.isPending}
            error={restore.error}
            onCancel={() => setRestoring(null)}
            onRestore={(reason) =>
              restore.mutate(
                { version: restoring, reason, baseVersion: item.version },
                {
                  onSuccess: (r) => {
                    setNotice(`Version ${restoring} restored as version ${r.data.version} (${r.data.status}).`);
                    setRestoring(null);
                  },
                },
              )
            }
          />
        )}
      </section>
      <section aria-labelledby="diff-heading">
        <h2 id="diff-heading" className="mb-3 font-serif text-2xl">
          {diff.data ? (diff.data.data.from ? `Changes from v${diff.data.data.from} to v${diff.data.data.to}` : `Content of v${diff.data.data.to}`) : 'Changes'}
        </h2>
        {diff.isPending ? <PageSpinner label="Comparing…" /> : diff.isError ? <Alert tone="danger">{errorMessage(diff.error)}</Alert> : <DiffView changes={diff.data.data.changes} />}
      </section>
    </>
  );
}
