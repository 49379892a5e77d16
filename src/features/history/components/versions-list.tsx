import type { RevisionSummary } from '@shared/review/types';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { stateLabels } from '@shared/catalogue/workflow';
import { formatDate } from '@/lib/format';

export interface VersionsListProps {
  versions: RevisionSummary[];
  from?: number;
  to?: number;
  onCompare: (from: number, to: number) => void;
  /** Link to a version's permalink page. */
  permalink: (version: number) => string;
  onRestore?: (version: number) => void;
  currentVersion: number;
}

/** Versions newest first, each with its author, time, reason and state; pick two to compare. */
export function VersionsList({ versions, from, to, onCompare, permalink, onRestore, currentVersion }: VersionsListProps) {
  return (
    <div role="region" aria-label="Versions" tabIndex={0} className="overflow-x-auto rounded-soft border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-[0.9375rem]">
        <caption className="sr-only">Versions, newest first. Choose “from” and “to” to compare two.</caption>
        <thead className="bg-paper-sunk text-sm">
          <tr>
            <th scope="col" className="px-3 py-2">Version</th>
            <th scope="col" className="px-3 py-2">From</th>
            <th scope="col" className="px-3 py-2">To</th>
            <th scope="col" className="px-3 py-2">State</th>
            <th scope="col" className="px-3 py-2">By, when, why</th>
            {onRestore && <th scope="col" className="px-3 py-2"><span className="sr-only">Restore</span></th>}
          </tr>
        </thead>
        <tbody>
          {versions.map((v) => (
            <tr key={v.version} className="border-t border-rule align-top">
              <td className="figures px-3 py-2">
                <a href={permalink(v.version)}>v{v.version}</a>
                {v.version === currentVersion && <span className="label-caps ml-2 text-ink-muted">current</span>}
              </td>
              <td className="px-3 py-2">
                <input type="radio" name="from" aria-label={`Compare from version ${v.version}`} checked={from === v.version} disabled={to !== undefined && v.version >= to} onChange={() => onCompare(v.version, to ?? currentVersion)} className="accent-accent" />
              </td>
              <td className="px-3 py-2">
                <input type="radio" name="to" aria-label={`Compare to version ${v.version}`} checked={to === v.version} disabled={from !== undefined && v.version <= from} onChange={() => onCompare(from ?? v.version - 1, v.version)} className="accent-accent" />
              </td>
              <td className="px-3 py-2 text-sm">
                {v.status ? stateLabels[v.status as WorkflowState] : '—'}
                {v.approved && <span className="label-caps ml-2 text-accent-strong">✓ approved</span>}
              </td>
              <td className="px-3 py-2 text-sm">
                {v.author?.displayName ?? 'Unknown'}, <span className="figures">{formatDate(v.createdAt)}</span>
                {v.reason && <p className="text-ink-muted">{v.reason}</p>}
              </td>
              {onRestore && (
                <td className="px-3 py-2">
                  {v.version !== currentVersion && (
                    <button type="button" className="text-sm text-accent-strong underline" onClick={() => onRestore(v.version)}>
                      Restore v{v.version}
                    </button>
                  )}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
