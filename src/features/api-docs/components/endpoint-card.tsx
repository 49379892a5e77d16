import { cn } from '@/lib/cn';
import { describeSchema, type Endpoint, type HttpMethod, type Parameter } from '../lib/openapi';

/** Method badges: the word itself carries the meaning; the border only echoes it. */
const methodLook: Record<HttpMethod, string> = {
  get: 'border-accent text-accent-strong',
  post: 'border-caution text-caution',
  put: 'border-caution text-caution',
  patch: 'border-caution text-caution',
  delete: 'border-danger text-danger',
};

export function MethodBadge({ method }: { method: HttpMethod }) {
  return <span className={cn('inline-block w-16 shrink-0 rounded-soft border bg-paper px-1.5 text-center font-mono text-xs font-semibold uppercase', methodLook[method])}>{method}</span>;
}

function ParameterRow({ p }: { p: Parameter }) {
  const s = describeSchema(p.schema);
  return (
    <tr className="border-t border-rule align-top">
      <th scope="row" className="px-3 py-1.5 text-left font-mono text-[0.8125rem] font-normal text-ink">{p.name}</th>
      <td className="px-3 py-1.5">{p.in}</td>
      <td className="px-3 py-1.5">{p.required ? 'required' : 'optional'}</td>
      <td className="px-3 py-1.5">
        <span className="font-mono text-[0.8125rem]">{s.type}</span>
        {s.values && (
          <span className="block text-ink-muted">
            one of: <span className="font-mono text-[0.8125rem]">{s.values.join(', ')}</span>
          </span>
        )}
        {s.notes.length > 0 && <span className="block text-ink-muted">{s.notes.join('; ')}</span>}
        {p.description && <span className="block text-ink-muted">{p.description}</span>}
      </td>
      <td className="figures px-3 py-1.5 font-mono text-[0.8125rem]">{s.defaultValue ?? '—'}</td>
    </tr>
  );
}

/** One endpoint, collapsed to its method and path; opens (Enter or Space) to its parameters, body and answers. */
export function EndpointCard({ endpoint, open }: { endpoint: Endpoint; open?: boolean }) {
  const { method, path, operation, id } = endpoint;
  const parameters = operation.parameters ?? [];
  const body = operation.requestBody?.content?.['application/json']?.schema;
  const responses = Object.entries(operation.responses ?? {});
  return (
    <details id={id} open={open} className="group rounded-soft border border-rule bg-paper-raised open:shadow-leaf">
      <summary className="flex cursor-pointer list-none items-center gap-3 px-3 py-2 [&::-webkit-details-marker]:hidden">
        <MethodBadge method={method} />
        <code className="min-w-0 break-all font-mono text-[0.9375rem] text-ink">{path}</code>
        {operation.summary && <span className="hidden text-sm text-ink-muted md:inline">{operation.summary}</span>}
        <span aria-hidden="true" className="ml-auto text-ink-faint transition-transform group-open:rotate-90">›</span>
      </summary>
      <div className="space-y-4 border-t border-rule px-3 py-3 text-sm">
        {operation.description && <p className="text-ink-muted">{operation.description}</p>}
        <section aria-label={`Parameters of ${method.toUpperCase()} ${path}`}>
          <h4 className="label-caps text-ink-muted">Parameters</h4>
          {parameters.length ? (
            <div className="mt-1 overflow-x-auto">
              <table className="w-full border-collapse text-left">
                <thead>
                  <tr className="text-ink-muted">
                    <th scope="col" className="px-3 py-1 font-medium">Name</th>
                    <th scope="col" className="px-3 py-1 font-medium">In</th>
                    <th scope="col" className="px-3 py-1 font-medium">Required</th>
                    <th scope="col" className="px-3 py-1 font-medium">Schema</th>
                    <th scope="col" className="px-3 py-1 font-medium">Default</th>
                  </tr>
                </thead>
                <tbody>
                  {parameters.map((p) => (
                    <ParameterRow key={`${p.in}-${p.name}`} p={p} />
                  ))}
                </tbody>
              </table>
            </div>
          ) : (
            <p className="mt-1 text-ink-muted">None.</p>
          )}
        </section>
        {body && (
          <section aria-label={`Request body of ${method.toUpperCase()} ${path}`}>
            <h4 className="label-caps text-ink-muted">Request body (JSON{operation.requestBody?.required ? ', required' : ''})</h4>
            <pre tabIndex={0} className="mt-1 max-h-80 overflow-auto rounded-soft bg-paper-sunk p-3 font-mono text-xs leading-relaxed text-ink">{JSON.stringify(body, null, 2)}</pre>
          </section>
        )}
        <section aria-label={`Answers of ${method.toUpperCase()} ${path}`}>
          <h4 className="label-caps text-ink-muted">Answers</h4>
          <ul className="mt-1 space-y-0.5">
            {responses.map(([status, r]) => (
              <li key={status}>
                <span className="figures font-mono font-semibold">{status}</span> — {r.description ?? ''}
                {r.content?.['application/json']?.schema && /^[45]/.test(status) && (
                  <>
                    {' '}
                    (<a href="#error-contract">error contract</a>)
                  </>
                )}
              </li>
            ))}
          </ul>
        </section>
      </div>
    </details>
  );
}
