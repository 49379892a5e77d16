import { useId, useState } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { FormSection } from '@/features/contribute/components/form-section';
import { TextareaField } from '@/components/textarea-field';
import { fieldDomId } from '@/features/contribute/lib/flatten-errors';
import { cn } from '@/lib/cn';
import { excerptFieldLabels as labels, excerptFormId, type ExcerptFormValues } from './values';

export interface CommentaryFieldProps {
  /** The commentary as last saved, and the server's sanitised rendering of it. */
  saved?: { markdown: string | null; html: string | null };
}

/** Paragraphs of the Markdown as plain text: a preview that needs no renderer. */
function PlainPreview({ text }: { text: string }) {
  const paragraphs = text.split(/\n\s*\n/).filter((p) => p.trim());
  return (
    <>
      {paragraphs.map((p, i) => (
        <p key={i} className="mb-3 whitespace-pre-line last:mb-0">
          {p}
        </p>
      ))}
    </>
  );
}

export function CommentaryField({ saved }: CommentaryFieldProps) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<ExcerptFormValues>();
  const [previewing, setPreviewing] = useState(false);
  const text = useWatch({ control, name: 'commentary' }) ?? '';
  const tabs = useId();
  const unchanged = saved?.html && (saved.markdown ?? '') === text;

  return (
    <FormSection title="Commentary" description="Your scholarship on the passage, credited to you. Markdown: *italic*, **bold**, [link](https://…), blank line between paragraphs.">
      <div role="tablist" aria-label="Commentary view" className="flex gap-1">
        {(['Write', 'Preview'] as const).map((name) => {
          const selected = (name === 'Preview') === previewing;
          return (
            <button
              key={name}
              type="button"
              role="tab"
              id={`${tabs}-${name}`}
              aria-selected={selected}
              aria-controls={`${tabs}-panel`}
              onClick={() => setPreviewing(name === 'Preview')}
              className={cn('rounded-t-soft border border-b-0 px-3 py-1 text-sm', selected ? 'border-rule-strong bg-paper-raised font-medium' : 'border-transparent text-ink-muted')}
            >
              {name}
            </button>
          );
        })}
      </div>
      <div id={`${tabs}-panel`} role="tabpanel" aria-labelledby={`${tabs}-${previewing ? 'Preview' : 'Write'}`}>
        <div hidden={previewing}>
          <TextareaField
            id={fieldDomId(excerptFormId, 'commentary')}
            label={labels.commentary}
            labelSuffix="(optional)"
            rows={8}
            error={errors.commentary?.message}
            {...register('commentary')}
          />
        </div>
        {previewing && (
          <div className="min-h-32 rounded-soft border border-rule bg-paper px-4 py-3 leading-relaxed">
            {!text.trim() ? (
              <p className="text-ink-muted">Nothing written yet.</p>
            ) : unchanged ? (
              // Sanitised on the server (server/services/commentary-html.ts).
              <div className="commentary" dangerouslySetInnerHTML={{ __html: saved?.html ?? '' }} />
            ) : (
              <>
                <p className="mb-2 text-sm text-ink-muted">Plain preview; formatting is shown once saved.</p>
                <PlainPreview text={text} />
              </>
            )}
          </div>
        )}
      </div>
    </FormSection>
  );
}
