import { useSession, hasRole } from '@/features/auth/api/get-session';
import { contributorRoles } from '@/lib/roles';
import { EntryCard } from '../components/entry-card';
import { HomeSearch } from '../components/home-search';
import { HomeInsights } from '@/features/insights/components/insights-panel'; // insights charts (issue 9)

export function Component() {
  const { user, role } = useSession();
  const canContribute = hasRole(role, contributorRoles);

  return (
    <div className="space-y-12">
      <title>Windway · Primary sources on historical woodwinds</title>
      <section aria-labelledby="home-title" className="max-w-reading">
        <h1 id="home-title" className="font-serif text-4xl font-medium leading-tight sm:text-5xl">
          What the old sources say about recorders and flutes
        </h1>
        <div className="mt-4 space-y-3 font-serif text-xl text-ink-muted">
          <p>
            Windway gathers treatises, account books, inventories, prefaces and letters that mention recorders and the
            one-keyed flute, each passage transcribed beside its facsimile and tagged with the instrument sizes, pitch
            and date it concerns.
          </p>
          <p>
            Researchers contribute, editors check every passage against the page, and performers and teachers can
            quote it with a proper citation.
          </p>
        </div>
      </section>

      <section aria-label="Search" className="max-w-reading">
        <HomeSearch />
      </section>

      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <EntryCard to="/reckoner" title="Pitch & size reckoner">
          Which note does a voice flute sound at a′ = 415 Hz? Work out sounding pitch, fingering keys and dual dates.
        </EntryCard>
        <EntryCard to="/sources" title="Sources">
          Browse the documents themselves, with where each is held, its shelfmark and how to cite it.
        </EntryCard>
        {canContribute ? (
          <EntryCard to="/contribute" title="Contribute">
            Catalogue a source, upload its facsimile and transcribe the passages that matter.
          </EntryCard>
        ) : (
          <EntryCard to={user ? '/account' : '/register'} title="Contribute">
            {user
              ? 'Contributing needs the contributor role; your account page says how to ask for it.'
              : 'Found a source? Create an account; researchers can then be given the contributor role.'}
          </EntryCard>
        )}
      </ul>

      {/* insights charts (issue 9): timeline and pitch of all approved material */}
      <HomeInsights />
    </div>
  );
}
