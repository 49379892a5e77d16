import { useEffect, useState, type FormEvent } from 'react';
import { roles, type Role } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { roleLabels } from '@/lib/roles';

export interface UserFiltersProps {
  q: string;
  role: Role | '';
  onChange: (filters: { q: string; role: Role | '' }) => void;
}

/** Text search (applied on submit) and a role filter (applied at once). */
export function UserFilters({ q, role, onChange }: UserFiltersProps) {
  const [text, setText] = useState(q);
  useEffect(() => setText(q), [q]);

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onChange({ q: text.trim(), role });
  };

  return (
    <form role="search" aria-label="Filter users" onSubmit={onSubmit} className="mb-4 flex flex-wrap items-end gap-3">
      <TextField
        label="Name or e-mail"
        type="search"
        value={text}
        onChange={(event) => setText(event.target.value)}
        containerClassName="min-w-[14rem] flex-1"
      />
      <Select
        label="Role"
        value={role}
        onChange={(event) => onChange({ q: text.trim(), role: event.target.value as Role | '' })}
        containerClassName="w-44"
      >
        <option value="">All roles</option>
        {roles.map((r) => (
          <option key={r} value={r}>
            {roleLabels[r]}
          </option>
        ))}
      </Select>
      <Button type="submit" variant="secondary">
        Apply
      </Button>
    </form>
  );
}
