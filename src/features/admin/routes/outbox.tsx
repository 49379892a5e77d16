import { ComingSoon } from '../components/coming-soon';

export function Component() {
  return <ComingSoon title="Outbox" description="Mail sent or captured by this installation: review notices, reset links." />;
}
