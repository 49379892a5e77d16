import { ComingSoon } from '../components/coming-soon';

export function Component() {
  return (
    <ComingSoon title="Re-index" description="Rebuild the search index from the database and follow the search outbox." />
  );
}
