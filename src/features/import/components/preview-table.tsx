import type { SourceInput } from '@shared/catalogue/schemas';
import { sourceTypeLabels, sourceTypes } from '@shared/catalogue/vocabulary';
import type { ImportPreviewEntry } from '@shared/citations/import-types';
import { Link } from 'react-router-dom';

export interface Row {
  entry: ImportPreviewEntry;
  fields: SourceInput;
  include: boolean;
}

const input = 'field-control w-full min-w-0 px-2 py-1 text-sm';

/** One row per parsed entry: the mapped fields (editable), validation messages and duplicate warnings. */
export function PreviewTable({ rows, onChange, serverErrors }: { rows: Row[]; onChange: (rows: Row[]) => void; serverErrors: Record<string, string> }) {
  const set = (i: number, patch: Partial<SourceInput>) => onChange(rows.map((r, j) => (j === i ? { ...r, fields: { ...r.fields, ...patch } } : r)));
  let position = -1;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-rule-strong text-left">
            <th className="p-2">Import</th><th className="p-2">Line</th><th className="p-2">Title</th><th className="p-2">Kind</th><th className="p-2">Date (EDTF)</th>
            <th className="p-2">Languages</th><th className="p-2">Creators</th><th className="p-2">Holding institution</th><th className="p-2">Shelfmark</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => {
            if (row.include) position += 1;
            const at = position;
            const error = (field: string) => (row.include ? serverErrors[`entries.${at}.${field}`] : undefined) ?? row.entry.errors?.[field];
            const messages = Object.entries(row.entry.errors ?? {}).map(([k, v]) => `${k}: ${v}`);
            return (
              <tr key={row.entry.index} className="border-b border-rule align-top">
                <td className="p-2"><input type="checkbox" aria-label={`Import entry ${i + 1}`} checked={row.include} onChange={(e) => onChange(rows.map((r, j) => (j === i ? { ...r, include: e.target.checked } : r)))} /></td>
                <td className="p-2 [font-variant-numeric:tabular-nums]">{row.entry.line ?? '—'}</td>
                <td className="p-1">
                  <input aria-label={`Title of entry ${i + 1}`} className={input} value={row.fields.title} onChange={(e) => set(i, { title: e.target.value })} aria-invalid={!!error('title')} />
                  {row.entry.duplicates.map((d, k) => (
                    <p key={k} className="mt-1 text-caution">⚠ Possible duplicate: {d.id ? <Link to={`/sources/${d.id}`}>{d.message}</Link> : d.message}</p>
                  ))}
                  {messages.length > 0 && <p className="mt-1 text-danger">{messages.join(' ')}</p>}
                </td>
                <td className="p-1">
                  <select aria-label={`Kind of entry ${i + 1}`} className={input} value={row.fields.sourceType} onChange={(e) => set(i, { sourceType: e.target.value as SourceInput['sourceType'] })}>
                    {sourceTypes.map((t) => <option key={t} value={t}>{sourceTypeLabels[t]}</option>)}
                  </select>
                </td>
                <td className="p-1"><input aria-label={`Date of entry ${i + 1}`} className={input} value={row.fields.dateEdtf} onChange={(e) => set(i, { dateEdtf: e.target.value })} aria-invalid={!!error('dateEdtf')} title={error('dateEdtf')} /></td>
                <td className="p-1"><input aria-label={`Languages of entry ${i + 1}`} className={input} value={row.fields.languages.join(', ')} onChange={(e) => set(i, { languages: e.target.value.split(/[,\s]+/).filter(Boolean) })} aria-invalid={!!error('languages')} title={error('languages')} /></td>
                <td className="p-2">{(row.fields.creators ?? []).map((c) => `${c.name} (${c.role})`).join('; ') || '—'}</td>
                <td className="p-1"><input aria-label={`Holding institution of entry ${i + 1}`} className={input} value={row.fields.holdingInstitution ?? ''} onChange={(e) => set(i, { holdingInstitution: e.target.value })} /></td>
                <td className="p-1"><input aria-label={`Shelfmark of entry ${i + 1}`} className={input} value={row.fields.shelfmark ?? ''} onChange={(e) => set(i, { shelfmark: e.target.value })} /></td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
