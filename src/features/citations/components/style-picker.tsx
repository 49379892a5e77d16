import { Select } from '@/components/select';
import { useCitationStyles } from '../api/citations';

/** The styles the server offers: Windway's two first, then every installed CSL style by title. */
export function StylePicker({ value, onChange, label = 'Style' }: { value: string; onChange: (id: string) => void; label?: string }) {
  const styles = useCitationStyles();
  const list = styles.data ?? [{ id: 'notes', title: 'Notes and bibliography', kind: 'note' as const }, { id: 'author-date', title: 'Author-date', kind: 'in-text' as const }];
  return (
    <Select label={label} value={value} onChange={(e) => onChange(e.target.value)} disabled={styles.isLoading} hint={styles.isError ? 'The list of styles could not be loaded.' : undefined}>
      <optgroup label="Windway">
        {list.slice(0, 2).map((s) => (
          <option key={s.id} value={s.id}>{s.title}</option>
        ))}
      </optgroup>
      <optgroup label="More styles">
        {list.slice(2).map((s) => (
          <option key={s.id} value={s.id}>{`${s.title}${s.kind === 'note' ? ' (notes)' : ''}`}</option>
        ))}
      </optgroup>
    </Select>
  );
}
