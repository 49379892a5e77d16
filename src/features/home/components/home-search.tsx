import { useId, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '@/components/button';

/** A search box that opens /search?q=… */
export function HomeSearch() {
  const [q, setQ] = useState('');
  const navigate = useNavigate();
  const inputId = useId();
  const hintId = useId();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const query = q.trim();
    navigate(query ? `/search?q=${encodeURIComponent(query)}` : '/search');
  };

  return (
    <form role="search" onSubmit={onSubmit} className="w-full">
      <label htmlFor={inputId} className="block text-sm font-medium text-ink">
        Search the sources
      </label>
      <p id={hintId} className="mt-1 text-sm text-ink-muted">
        Old spellings are welcome: try <span className="font-serif italic">flûte douce</span>,{' '}
        <span className="font-serif italic">flauto</span> or <span className="font-serif italic">voice flute</span>.
      </p>
      <div className="mt-2 flex flex-col gap-2 sm:flex-row">
        <input
          id={inputId}
          type="search"
          name="q"
          value={q}
          onChange={(event) => setQ(event.target.value)}
          aria-describedby={hintId}
          className="field-control text-lg"
          autoComplete="off"
        />
        <Button type="submit" className="shrink-0">
          Search
        </Button>
      </div>
    </form>
  );
}
