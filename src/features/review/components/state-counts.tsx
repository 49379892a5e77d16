import type { StateCounts } from '@shared/review/types';
import { stateLabels } from '@shared/catalogue/workflow';
import { workflowStates } from '@shared/catalogue/vocabulary';

/** How many sources and excerpts are in each state: a small table, figures aligned. */
export function StateCountsTable({ counts }: { counts: StateCounts }) {
  return (
    <div role="region" aria-label="Counts by state" tabIndex={0} className="mb-6 overflow-x-auto">
      <table className="figures w-full border-collapse text-sm">
        <caption className="sr-only">Sources and excerpts by state</caption>
        <thead>
          <tr className="text-left text-ink-muted">
            <th scope="col" className="py-1 pr-4 font-medium"><span className="sr-only">Kind</span></th>
            {workflowStates.map((s) => (
              <th key={s} scope="col" className="py-1 pr-4 font-medium">{stateLabels[s]}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {(['source', 'excerpt'] as const).map((kind) => (
            <tr key={kind} className="border-t border-rule">
              <th scope="row" className="py-1 pr-4 text-left font-medium">{kind === 'source' ? 'Sources' : 'Excerpts'}</th>
              {workflowStates.map((s) => (
                <td key={s} className={s === 'submitted' ? 'py-1 pr-4 font-semibold' : 'py-1 pr-4'}>{counts[kind][s]}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
