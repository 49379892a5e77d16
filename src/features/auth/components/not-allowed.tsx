import { Link } from 'react-router-dom';
import type { Role } from '@shared/schemas/auth';
import { PageHeader } from '@/components/page-header';
import { Card } from '@/components/card';
import { roleLabels } from '@/lib/roles';

function listRoles(roles: readonly Role[]): string {
  const names = roles.map((r) => roleLabels[r].toLowerCase() + 's');
  return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
}

export interface NotAllowedProps {
  role: Role;
  allowed: readonly Role[];
  /** The section's name, e.g. "Review". */
  section?: string;
}

/** Shown to a signed-in person whose role does not open this page. */
export function NotAllowed({ role, allowed, section }: NotAllowedProps) {
  return (
    <div className="mx-auto max-w-reading">
      <PageHeader eyebrow="Not available to your account" title={section ? `${section} is not open to you` : 'This page is not open to you'} />
      <Card>
        <p>
          You are signed in as a <strong>{roleLabels[role].toLowerCase()}</strong>.{' '}
          {section ?? 'This page'} is for {listRoles(allowed)}.
        </p>
        <p className="mt-3 text-ink-muted">
          If you need access, ask an admin of this Windway installation to change your role.
        </p>
        <p className="mt-4 flex flex-wrap gap-4">
          <Link to="/">Go to the home page</Link>
          <Link to="/account">See your account</Link>
        </p>
      </Card>
    </div>
  );
}
