import { useId, useState } from 'react';
import { ReckonerError, resolveSizeDescription, type ResolvedSize } from '@shared/reckoner';
import { Button } from '@/components/button';
import { cn } from '@/lib/cn';

export interface RelativeSizeInputProps {
  /** Called with the proposed size's slug when the person accepts it. */
  onUse: (slug: string) => void;
  /** Distinguishes this input from others on the page, e.g. "mention 2". */
  context?: string;
}

function intervalWords(semitones: number): string {
  const n = Math.abs(semitones);
  return `${n} semitone${n === 1 ? '' : 's'} ${semitones < 0 ? 'below' : 'above'}`;
}

/**
 * "a tone and a half below the treble" → a proposed size, using the Reckoner's size-phrase
 * parser; its message is shown beside the input when the phrase does not resolve.
 */
export function RelativeSizeInput({ onUse, context }: RelativeSizeInputProps) {
  const id = useId();
  const [text, setText] = useState('');
  const [result, setResult] = useState<{ size?: ResolvedSize; error?: string } | null>(null);

  const resolve = (value: string) => {
    if (!value.trim()) {
      setResult(null);
      return;
    }
    try {
      setResult({ size: resolveSizeDescription(value, 'description') });
    } catch (error) {
      setResult({ error: error instanceof ReckonerError ? error.message : 'This description could not be read.' });
    }
  };

  const resultId = `${id}-result`;
  return (
    <div className="rounded-soft border border-dashed border-rule-strong p-3">
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        Describe the size relative to another{context ? <span className="sr-only"> ({context})</span> : null}
      </label>
      <div className="mt-1 flex flex-wrap gap-2">
        <input
          id={id}
          type="text"
          value={text}
          placeholder="a tone and a half below the treble"
          autoComplete="off"
          aria-invalid={result?.error ? true : undefined}
          aria-describedby={resultId}
          onChange={(event) => {
            setText(event.target.value);
            if (result) resolve(event.target.value);
          }}
          onKeyDown={(event) => {
            if (event.key === 'Enter') {
              event.preventDefault();
              resolve(text);
            }
          }}
          className={cn('field-control min-w-0 flex-1', result?.error && 'border-danger')}
        />
        <Button variant="secondary" size="sm" onClick={() => resolve(text)} disabled={!text.trim()}>
          Propose a size
        </Button>
      </div>
      <div id={resultId} aria-live="polite" className="mt-2 min-h-6 text-sm">
        {result?.size && (
          <div className="flex flex-wrap items-center gap-3">
            <p>
              Proposed: <strong data-slug={result.size.size.slug}>{result.size.size.name}</strong>{' '}
              <code className="text-ink-muted">{result.size.size.slug}</code>
              <span className="block text-ink-muted">
                Lowest note {result.size.size.nominalLowest}, {intervalWords(result.size.semitones)} the {result.size.reference.name.toLowerCase()} (
                {result.size.reference.nominalLowest}).
              </span>
            </p>
            <Button size="sm" onClick={() => result.size && onUse(result.size.size.slug)}>
              Use {result.size.size.name}
            </Button>
          </div>
        )}
        {result?.error && (
          <p className="font-medium text-danger">
            <span className="sr-only">Error: </span>
            {result.error}
          </p>
        )}
      </div>
    </div>
  );
}
