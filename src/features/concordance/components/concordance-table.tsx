import { Link } from 'react-router-dom';
import type { ConcordanceEntry } from '@shared/review/types';
import { certainties } from '@shared/catalogue/vocabulary';

export interface ConcordanceTableProps {
  entries: ConcordanceEntry[];
  /** Editors get a "Correct" button per term and size. */
  onCorrect?: (entry: ConcordanceEntry, sizeSlug: string) => void;
}

/** Terms as written (with language) → the sizes they denote, counts, certainty and example excerpts. */
export function ConcordanceTable({ entries, onCorrect }: ConcordanceTableProps) {
  return (
    <div role="region" aria-label="Concordance" tabIndex={0} className="overflow-x-auto rounded-soft border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-[0.9375rem]">
        <caption className="sr-only">Historical terms and the instrument sizes they denote</caption>
        <thead className="bg-paper-sunk text-sm">
          <tr>
            <th scope="col" className="px-3 py-2">Term as written</th>
            <th scope="col" className="px-3 py-2">Language</th>
            <th scope="col" className="px-3 py-2">Size denoted</th>
            <th scope="col" className="px-3 py-2">Excerpts</th>
            <th scope="col" className="px-3 py-2">Certainty</th>
            <th scope="col" className="px-3 py-2">Examples</th>
            {onCorrect && <th scope="col" className="px-3 py-2"><span className="sr-only">Editor tools</span></th>}
          </tr>
        </thead>
        <tbody>
          {entries.flatMap((entry) =>
            entry.sizes.map((size, i) => (
              <tr key={`${entry.term}|${entry.language}|${size.sizeSlug}`} className={i === 0 ? 'border-t border-rule align-top' : 'align-top'}>
                {i === 0 && (
                  <th scope="rowgroup" rowSpan={entry.sizes.length} className="px-3 py-2 font-serif text-lg font-normal italic" lang={entry.language}>
                    {entry.term}
                  </th>
                )}
                {i === 0 && <td rowSpan={entry.sizes.length} className="px-3 py-2 text-sm">{entry.language}</td>}
                <td className="px-3 py-2">{size.sizeName}</td>
                <td className="figures px-3 py-2">{size.excerpts}</td>
                <td className="figures px-3 py-2 text-sm">
                  {certainties.filter((c) => size.certainty[c] > 0).map((c) => `${c} ${size.certainty[c]}`).join(', ')}
                </td>
                <td className="px-3 py-2 text-sm">
                  {size.examples.map((id, n) => (
                    <span key={id}>
                      {n > 0 && ', '}
                      <Link to={`/excerpts/${id}`}>{id}</Link>
                    </span>
                  ))}
                </td>
                {onCorrect && (
                  <td className="px-3 py-2">
                    <button type="button" className="text-sm text-accent-strong underline" onClick={() => onCorrect(entry, size.sizeSlug)}>
                      Correct<span className="sr-only"> “{entry.term}” as {size.sizeName}</span>
                    </button>
                  </td>
                )}
              </tr>
            )),
          )}
        </tbody>
      </table>
    </div>
  );
}
