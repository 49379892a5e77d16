import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';

const sections = [
  { to: '/admin/users', title: 'Users', text: 'Roles, deactivation and who has confirmed their e-mail address.', ready: true },
  { to: '/admin/outbox', title: 'Outbox', text: 'Mail that Windway has sent or captured, such as review notices and reset links.', ready: true },
  { to: '/admin/reindex', title: 'Re-index', text: 'Rebuild the search index from the database while the archive keeps answering.', ready: true },
];

export function Component() {
  return (
    <>
      <PageHeader eyebrow="Admin" title="Running Windway" description="Accounts, mail and the search index of this installation." />
      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {sections.map((s) => (
          <li key={s.to} className="rounded-soft border border-rule bg-paper-raised p-5 shadow-leaf">
            <h2 className="font-serif text-xl font-medium">
              <Link to={s.to}>{s.title}</Link>
            </h2>
            <p className="mt-2 text-[0.9375rem] text-ink-muted">{s.text}</p>
            {!s.ready && <p className="label-caps mt-3 text-caution">Coming soon</p>}
          </li>
        ))}
      </ul>
    </>
  );
}
