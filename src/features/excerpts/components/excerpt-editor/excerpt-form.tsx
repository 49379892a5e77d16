import { useState } from 'react';
import { FormProvider, useForm, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { createExcerptSchema, type ExcerptFields } from '@shared/catalogue/schemas';
import type { ExcerptDetail } from '@shared/catalogue/types';
import { Button } from '@/components/button';
import { ConflictNotice } from '@/features/contribute/components/conflict-notice';
import { DraftPrompt } from '@/features/contribute/components/draft-prompt';
import { ErrorSummary } from '@/features/contribute/components/error-summary';
import { RevisionNoteFields, useRevisionNote } from '@/features/contribute/components/revision-note-fields';
import { SaveBar } from '@/features/contribute/components/save-bar';
import { flattenErrors } from '@/features/contribute/lib/flatten-errors';
import { useEditConflict } from '@/features/contribute/lib/use-edit-conflict';
import { useFormDraft } from '@/features/contribute/lib/use-form-draft';
import { errorMessage, isApiError } from '@/lib/api';
import { useCreateExcerpt } from '../../api/create-excerpt';
import { getExcerptQueryOptions } from '../../api/get-excerpt';
import { useUpdateExcerpt } from '../../api/update-excerpt';
import { CommentaryField } from './commentary-field';
import { DateTopicsFields } from './date-topics-fields';
import { LocatorFields } from './locator-fields';
import { MentionsField } from './mentions-field';
import { PitchTagsField } from './pitch-tags-field';
import { TextFields } from './text-fields';
import { emptyExcerptValues, excerptFieldLabels, excerptFormId, excerptToFormValues, type ExcerptFormValues } from './values';

export interface ExcerptFormProps {
  source: { id: string; languages: string[]; dateLabel: string };
  /** The saved excerpt when editing. */
  excerpt?: ExcerptDetail;
  /** The page open in the facsimile viewer beside the form. */
  currentPage: number | null;
  onSaved: (excerpt: ExcerptDetail) => void;
  onCancel?: () => void;
  /** An editor editing an approved excerpt may publish the change without a new review. */
  canPublish?: boolean;
}

/** A translation's language and translator mean nothing without a translation. */
function toPayload(fields: ExcerptFields): ExcerptFields {
  return fields.translation ? fields : { ...fields, translationLanguage: null, translator: null };
}

/** Transcribe, translate and tag one passage; same safety as the source form (draft, conflicts, inline messages). */
export function ExcerptForm({ source, excerpt, currentPage, onSaved, onCancel, canPublish = false }: ExcerptFormProps) {
  const queryClient = useQueryClient();
  const form = useForm<ExcerptFormValues, unknown, ExcerptFields>({
    resolver: zodResolver(createExcerptSchema),
    defaultValues: excerpt ? excerptToFormValues(excerpt) : emptyExcerptValues(),
  });
  const { version, conflict, conflictRef, reapplying, reapply: reapplyOnLatest, markConflict, clearConflict } = useEditConflict<ExcerptFormValues>(
    form,
    { version: excerpt?.version ?? null, values: excerpt ? excerptToFormValues(excerpt) : null },
    excerptFieldLabels,
  );
  const draft = useFormDraft(form, excerpt ? `excerpt:${excerpt.id}` : `excerpt:new:${source.id}`, { baseVersion: version });
  const create = useCreateExcerpt();
  const update = useUpdateExcerpt();
  const note = useRevisionNote();
  const [attempt, setAttempt] = useState(0);
  const [serverError, setServerError] = useState<unknown>(null);

  const onError = (error: unknown) => {
    if (isApiError(error) && error.code === 'conflict') {
      markConflict();
      return;
    }
    if (isApiError(error) && error.fields) {
      for (const [path, message] of Object.entries(error.fields)) form.setError(path as Path<ExcerptFormValues>, { type: 'server', message });
    }
    setServerError(error);
    setAttempt((n) => n + 1);
  };

  const onValid = (values: ExcerptFields) => {
    setServerError(null);
    const done = {
      onSuccess: (result: { data: ExcerptDetail }) => {
        draft.clear();
        clearConflict();
        onSaved(result.data);
      },
      onError,
    };
    if (excerpt && version !== null) {
      if (note.check()) update.mutate({ id: excerpt.id, version, changes: toPayload(values), ...note.payload() }, done);
    } else create.mutate({ sourceId: source.id, fields: toPayload(values) }, done);
  };

  const reapply = async () => {
    if (!excerpt) return;
    try {
      await reapplyOnLatest(async () => {
        const latest = await queryClient.fetchQuery({ ...getExcerptQueryOptions(excerpt.id), staleTime: 0 });
        return { version: latest.data.version, values: excerptToFormValues(latest.data) };
      });
    } catch (error) {
      setServerError(error);
      setAttempt((n) => n + 1);
    }
  };

  const errors = flattenErrors(form.formState.errors);
  const serverMessage = serverError && !(isApiError(serverError) && serverError.fields && errors.length) ? errorMessage(serverError) : undefined;

  return (
    <FormProvider {...form}>
      <form
        id={excerptFormId}
        noValidate
        aria-label={excerpt ? `Edit excerpt ${excerpt.locator.label}` : 'New excerpt'}
        onSubmit={form.handleSubmit(onValid, () => {
          setServerError(null);
          setAttempt((n) => n + 1);
        })}
        className="space-y-6"
      >
        {draft.pending && <DraftPrompt draft={draft.pending} currentVersion={version} onRestore={draft.restore} onDiscard={draft.discard} />}
        {conflict && (
          <div ref={conflictRef} tabIndex={-1} className="outline-none">
            <ConflictNotice
              noun="excerpt"
              onReapply={() => void reapply()}
              reapplying={reapplying}
              reappliedVersion={conflict.reappliedVersion}
              overlapping={conflict.overlapping}
            />
          </div>
        )}
        <ErrorSummary
          attempt={attempt}
          errors={errors}
          form={excerptFormId}
          labels={excerptFieldLabels}
          message={serverMessage}
          title={serverError ? 'The excerpt was not saved' : 'Please check these fields'}
        />
        <LocatorFields currentPage={currentPage} />
        <TextFields />
        <CommentaryField saved={excerpt ? { markdown: excerpt.commentary, html: excerpt.commentaryHtml } : undefined} />
        <DateTopicsFields sourceDateLabel={source.dateLabel} />
        <MentionsField defaultLanguage={source.languages[0] ?? 'en'} />
        <PitchTagsField />
        {excerpt && <RevisionNoteFields note={note} canPublish={canPublish && excerpt.status === 'approved'} />}
        <SaveBar savedAt={draft.savedAt}>
          <Button type="submit" loading={create.isPending || update.isPending}>
            {excerpt ? 'Save changes' : 'Save excerpt'}
          </Button>
          {onCancel && (
            <Button variant="secondary" onClick={onCancel}>
              Cancel
            </Button>
          )}
        </SaveBar>
      </form>
    </FormProvider>
  );
}
