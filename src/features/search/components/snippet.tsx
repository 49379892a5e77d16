import { snippetRuns } from '@shared/search/schema';

/** A highlighted passage, rendered from the server's escaped snippet without innerHTML. */
export function Snippet({ html, lang }: { html: string; lang?: string }) {
  return (
    <p className="transcription text-ink" lang={lang}>
      {snippetRuns(html).map((run, i) =>
        run.marked ? (
          <mark key={i} className="rounded-sm bg-accent-soft px-0.5 text-ink underline decoration-accent decoration-2 underline-offset-4">
            {run.text}
          </mark>
        ) : (
          <span key={i}>{run.text}</span>
        ),
      )}
    </p>
  );
}
