import { Link } from 'react-router-dom';

const contract: { path: string; what: string }[] = [
  { path: 'GET /api/search', what: 'full-text search of excerpts with filters by size, family, source type, language, years and a′' },
  { path: 'GET /api/reckon/sounding, /fingering, /date', what: 'the Pitch & size reckoner: sounding pitch, fingering keys, EDTF and Old Style dates' },
  { path: 'GET /api/excerpts/:id/cite, /api/sources/:id/cite, POST /api/cite', what: 'citations as BibTeX, RIS, CSL-JSON, text or HTML' },
  { path: 'GET /api/sources/:id/tei', what: 'an approved source and its excerpts as TEI P5 XML' },
  { path: 'GET /oai?verb=…', what: 'OAI-PMH 2.0 with Dublin Core records, for libraries and aggregators' },
];

const errorExample = `{
  "error": {
    "code": "validation_failed",
    "message": "Some fields need fixing.",
    "fields": { "from": "from must be a number" }
  }
}`;

/** What to know before calling the API, in our own words. */
export function ApiIntro() {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <section aria-labelledby="api-basics" className="space-y-3">
        <h2 id="api-basics" className="font-serif text-2xl font-medium">Before you call it</h2>
        <p>
          Everything lives under <code>/api</code> and speaks JSON. Reading approved material needs no account. The list below is
          built from <a href="/api/openapi.json">the OpenAPI 3.1 description</a> the server writes from the same schemas it checks
          requests with, so it cannot fall behind the code.
        </p>
        <p>
          <strong>Writes need a token.</strong> Every <code>POST</code>, <code>PATCH</code>, <code>PUT</code> and <code>DELETE</code> carries an{' '}
          <code>X-CSRF-Token</code> header. Get the token from <code>GET /api/auth/me</code> (the <code>csrfToken</code> field; signing in
          or registering returns a fresh one) and send the session cookie with it.
        </p>
        <p>
          Some of these routes are a <strong>public contract</strong> that outside tools rely on; they change only with notice:
        </p>
        <ul className="list-disc space-y-1 pl-5">
          {contract.map((c) => (
            <li key={c.path}>
              <code>{c.path}</code> — {c.what}
            </li>
          ))}
        </ul>
        <p className="text-ink-muted">
          Trying pitch sums by hand? The <Link to="/reckoner">Pitch &amp; size reckoner</Link> uses the same calculations.
        </p>
      </section>
      <section id="error-contract" aria-labelledby="api-errors" className="space-y-3">
        <h2 id="api-errors" className="font-serif text-2xl font-medium">When something is wrong</h2>
        <p>
          Bad input gets a 4xx status and always the same body: a machine-readable <code>code</code>, a <code>message</code> you can
          show a person, and, for invalid input, <code>fields</code> naming each parameter or field to fix (unknown ones included).
        </p>
        <pre tabIndex={0} aria-label="Example error body" className="overflow-auto rounded-soft bg-paper-sunk p-3 font-mono text-xs leading-relaxed">{errorExample}</pre>
        <p className="text-ink-muted">
          Codes: <code>bad_request</code>, <code>validation_failed</code>, <code>unauthenticated</code>, <code>forbidden</code>,{' '}
          <code>csrf_invalid</code>, <code>not_found</code>, <code>conflict</code>, <code>payload_too_large</code>,{' '}
          <code>unsupported_media_type</code>, <code>rate_limited</code>; <code>unavailable</code> (503) when search or the database is away.
        </p>
      </section>
    </div>
  );
}
