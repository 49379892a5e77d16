import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export interface PlaceholderPageProps {
  title: string;
  description?: string;
}

/** Stands in for a section whose pages are still being written, so navigation works meanwhile. */
export function PlaceholderPage({ title, description }: PlaceholderPageProps) {
  return (
    <>
      <PageHeader title={title} description={description} />
      <EmptyState title="This section is being built" action={<Link to="/">Back to the home page</Link>}>
        <p>{title} will open here in a coming version of Windway.</p>
      </EmptyState>
    </>
  );
}
