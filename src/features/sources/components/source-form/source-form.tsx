import { useState } from 'react';
import { FormProvider, useForm, useWatch, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { createSourceSchema, type SourceFields } from '@shared/catalogue/schemas';
import type { SourceDetail } from '@shared/catalogue/types';
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
import { useCreateSource } from '../../api/create-source';
import { getSourceQueryOptions } from '../../api/get-source';
import { useUpdateSource } from '../../api/update-source';
import { DateFields } from './date-fields';
import { HoldingFields } from './holding-fields';
import { IdentificationFields } from './identification-fields';
import { PlaceLanguageFields } from './place-language-fields';
import { PublicationFields } from './publication-fields';
import { RightsFields } from './rights-fields';
import {
  emptySourceValues,
  isPrinted,
  sourceFieldLabels,
  sourceFormId,
  sourceToFormValues,
  toSourcePayload,
  type SourceFormValues,
} from './values';

export interface SourceFormProps {
  /** The saved source when editing; a new source otherwise. */
  source?: SourceDetail;
  onSaved: (source: SourceDetail) => void;
  onCancel?: () => void;
  /** An editor editing an approved source may publish the change without a new review. */
  canPublish?: boolean;
}

/** Catalogue a source, or edit one: shared schema, inline messages, a draft kept in the browser, safe on conflicts. */
export function SourceForm({ source, onSaved, onCancel, canPublish = false }: SourceFormProps) {
  const queryClient = useQueryClient();
  const form = useForm<SourceFormValues, unknown, SourceFields>({
    resolver: zodResolver(createSourceSchema),
    defaultValues: source ? sourceToFormValues(source) : emptySourceValues(),
  });
  const { version, conflict, conflictRef, reapplying, reapply: reapplyOnLatest, markConflict, clearConflict } = useEditConflict<SourceFormValues>(
    form,
    { version: source?.version ?? null, values: source ? sourceToFormValues(source) : null },
    sourceFieldLabels,
  );
  const draft = useFormDraft(form, source ? `source:${source.id}` : 'source:new', { baseVersion: version });
  const create = useCreateSource();
  const update = useUpdateSource();
  const note = useRevisionNote();
  const [attempt, setAttempt] = useState(0);
  const [serverError, setServerError] = useState<unknown>(null);
  const sourceType = useWatch({ control: form.control, name: 'sourceType' });

  const onError = (error: unknown) => {
    if (isApiError(error) && error.code === 'conflict') {
      markConflict();
      return;
    }
    if (isApiError(error) && error.fields) {
      for (const [path, message] of Object.entries(error.fields)) {
        form.setError(path as Path<SourceFormValues>, { type: 'server', message });
      }
    }
    setServerError(error);
    setAttempt((n) => n + 1);
  };

  const onValid = (values: SourceFields) => {
    setServerError(null);
    const payload = toSourcePayload(values);
    const done = {
      onSuccess: (result: { data: SourceDetail }) => {
        draft.clear();
        clearConflict();
        onSaved(result.data);
      },
      onError,
    };
    if (source && version !== null) {
      if (!note.check()) return;
      update.mutate({ id: source.id, version, changes: payload, ...note.payload() }, done);
    } else {
      create.mutate(payload, done);
    }
  };

  const reapply = async () => {
    if (!source) return;
    try {
      await reapplyOnLatest(async () => {
        const latest = await queryClient.fetchQuery({ ...getSourceQueryOptions(source.id), staleTime: 0 });
        return { version: latest.data.version, values: sourceToFormValues(latest.data) };
      });
    } catch (error) {
      setServerError(error);
      setAttempt((n) => n + 1);
    }
  };

  const errors = flattenErrors(form.formState.errors);
  const serverMessage = serverError && !(isApiError(serverError) && serverError.fields && errors.length) ? errorMessage(serverError) : undefined;
  const saving = create.isPending || update.isPending;

  return (
    <FormProvider {...form}>
      <form
        id={sourceFormId}
        noValidate
        aria-label={source ? `Edit ${source.title}` : 'New source'}
        onSubmit={form.handleSubmit(onValid, () => {
          setServerError(null);
          setAttempt((n) => n + 1);
        })}
        className="space-y-6"
      >
        {draft.pending && (
          <DraftPrompt draft={draft.pending} currentVersion={version} onRestore={draft.restore} onDiscard={draft.discard} />
        )}
        {conflict && (
          <div ref={conflictRef} tabIndex={-1} className="outline-none">
            <ConflictNotice
              noun="source"
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
          form={sourceFormId}
          labels={sourceFieldLabels}
          message={serverMessage}
          title={serverError ? 'The source was not saved' : 'Please check these fields'}
        />

        <IdentificationFields />
        <DateFields />
        <PlaceLanguageFields />
        <HoldingFields />
        {isPrinted(sourceType) && <PublicationFields />}
        <RightsFields />

        {source && <RevisionNoteFields note={note} canPublish={canPublish && source.status === 'approved'} />}

        <SaveBar savedAt={draft.savedAt}>
          <Button type="submit" loading={saving}>
            {source ? 'Save changes' : 'Save as draft'}
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
