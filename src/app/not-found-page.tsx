import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Page not found" />
      <EmptyState
        title="Nothing is kept at this address"
        action={
          <span className="flex justify-center gap-4">
            <Link to="/">Home</Link>
            <Link to="/search">Search</Link>
          </span>
        }
      >
        <p>The link may be mistyped, or the page may have moved.</p>
      </EmptyState>
    </>
  );
}
