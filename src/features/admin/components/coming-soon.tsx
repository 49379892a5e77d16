import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

/** An admin tool that is planned but not yet built. */
export function ComingSoon({ title, description }: { title: string; description: string }) {
  return (
    <>
      <PageHeader eyebrow="Admin" title={title} description={description} />
      <EmptyState title="This section is being built" action={<Link to="/admin">Back to Admin</Link>}>
        <p>The {title.toLowerCase()} tool will open here in a coming version of Windway.</p>
      </EmptyState>
    </>
  );
}
