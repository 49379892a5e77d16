import { useState, type KeyboardEvent } from 'react';
import { languageTagSchema } from '@shared/catalogue/schemas';
import { Button } from '@/components/button';
import { FieldError } from '@/components/field';
import { cn } from '@/lib/cn';
import { commonLanguages, languageName } from '../lib/language-tags';

export interface LanguageTagsFieldProps {
  /** Id of the text input (the target of error-summary links). */
  id: string;
  label: string;
  value: string[];
  onChange: (tags: string[]) => void;
  onBlur?: () => void;
  /** A message for the whole list, e.g. "Add at least one language". */
  error?: string;
  /** Messages for single tags, by index (from the schema or the server's `languages.0`). */
  itemErrors?: (string | undefined)[];
  max?: number;
}

/** BCP 47 tags as removable chips, typed or picked from the commonest languages. */
export function LanguageTagsField({ id, label, value, onChange, onBlur, error, itemErrors = [], max = 10 }: LanguageTagsFieldProps) {
  const [text, setText] = useState('');
  const [typingError, setTypingError] = useState('');
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const itemErrorsId = `${id}-item-errors`;
  const itemMessages = value.map((tag, i) => (itemErrors[i] ? `${tag}: ${itemErrors[i]}` : '')).filter(Boolean);
  const message = typingError || error;
  const describedBy = [hintId, message ? errorId : '', itemMessages.length ? itemErrorsId : ''].filter(Boolean).join(' ');

  const add = (raw: string) => {
    const parsed = languageTagSchema.safeParse(raw);
    if (!parsed.success) {
      setTypingError(parsed.error.issues[0]?.message ?? 'Not a language tag');
      return;
    }
    setTypingError('');
    setText('');
    if (!value.includes(parsed.data) && value.length < max) onChange([...value, parsed.data]);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if ((event.key === 'Enter' || event.key === ',') && text.trim()) {
      event.preventDefault();
      add(text);
    } else if (event.key === 'Backspace' && !text && value.length) {
      onChange(value.slice(0, -1));
    }
  };

  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      <p id={hintId} className="mt-1 text-sm text-ink-muted">
        BCP 47 tags such as <code>en</code>, <code>fr</code>, <code>de-AT</code>; press Enter to add.
      </p>
      {value.length > 0 && (
        <ul className="mt-2 flex flex-wrap gap-2" aria-label={`${label} chosen`}>
          {value.map((tag, i) => (
            <li
              key={tag}
              className={cn(
                'inline-flex items-center gap-1 rounded-full border bg-paper px-3 py-0.5 text-sm',
                itemErrors[i] ? 'border-danger' : 'border-rule-strong',
              )}
            >
              <span>{languageName(tag)}</span>
              <button
                type="button"
                className="ml-1 rounded-full px-1 text-ink-muted hover:text-danger"
                aria-label={`Remove ${languageName(tag)}`}
                onClick={() => onChange(value.filter((t) => t !== tag))}
              >
                <span aria-hidden="true">×</span>
              </button>
            </li>
          ))}
        </ul>
      )}
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <input
          id={id}
          type="text"
          value={text}
          autoComplete="off"
          spellCheck={false}
          aria-invalid={message || itemMessages.length ? true : undefined}
          aria-describedby={describedBy}
          onChange={(event) => setText(event.target.value)}
          onKeyDown={onKeyDown}
          onBlur={onBlur}
          className={cn('field-control max-w-40', message && 'border-danger')}
        />
        <Button variant="secondary" size="sm" onClick={() => add(text)} disabled={!text.trim()}>
          Add
        </Button>
        <span className="text-sm text-ink-muted" id={`${id}-quick`}>
          or pick:
        </span>
        {commonLanguages
          .filter((l) => !value.includes(l.tag))
          .map((l) => (
            <Button key={l.tag} variant="quiet" size="sm" aria-describedby={`${id}-quick`} onClick={() => add(l.tag)}>
              {l.name}
            </Button>
          ))}
      </div>
      <FieldError id={message ? errorId : undefined} message={message} />
      {itemMessages.length > 0 && (
        <ul id={itemErrorsId} className="mt-1 text-sm font-medium text-danger">
          {itemMessages.map((m) => (
            <li key={m}>
              <span className="sr-only">Error: </span>
              {m}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
