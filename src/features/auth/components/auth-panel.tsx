import type { ReactNode } from 'react';
import { PageHeader } from '@/components/page-header';

/** The narrow column that holds the sign-in, register and password pages. */
export function AuthPanel({ title, description, children }: { title: string; description?: ReactNode; children: ReactNode }) {
  return (
    <div className="mx-auto max-w-md">
      <PageHeader title={title} description={description} />
      {children}
    </div>
  );
}
