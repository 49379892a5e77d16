import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { FieldError } from '@/components/field';
import { errorMessage, isApiError } from '@/lib/api';
import { useUploadFacsimile } from '../api/upload-facsimile';
import { ProgressBar } from './progress-bar';

export interface UploadPanelProps {
  sourceId: string;
  rightsStatement: string | null;
}

const accepted = 'application/pdf,image/jpeg,image/png,image/tiff,image/webp,.pdf,.jpg,.jpeg,.png,.tif,.tiff,.webp';

function uploadProblem(error: unknown): { title: string; message: string } {
  if (isApiError(error)) {
    if (error.status === 413) return { title: 'The file is too large', message: `${error.message} Split the PDF or reduce the scan’s resolution, then try again.` };
    if (error.status === 415) return { title: 'This kind of file is not accepted', message: `${error.message} Upload a PDF, or a JPEG, PNG or TIFF image.` };
    if (error.status === 422) return { title: 'The file could not be read', message: error.message };
  }
  return { title: 'The upload did not finish', message: errorMessage(error) };
}

function sizeLabel(bytes: number): string {
  return bytes >= 1_048_576 ? `${(bytes / 1_048_576).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

/** Upload a facsimile with progress; the uploader confirms they may share it under the rights statement. */
export function UploadPanel({ sourceId, rightsStatement }: UploadPanelProps) {
  const upload = useUploadFacsimile();
  const [file, setFile] = useState<File | null>(null);
  const [confirmed, setConfirmed] = useState(false);
  const [tried, setTried] = useState(false);
  const [notice, setNotice] = useState('');
  const inputRef = useRef<HTMLInputElement>(null);
  const controller = useRef<AbortController | null>(null);

  const fileError = tried && !file ? 'Choose a PDF or an image file' : undefined;
  const confirmError = tried && !confirmed ? 'Confirm that you may share this facsimile' : undefined;

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setTried(true);
    setNotice('');
    if (!file || !confirmed) return;
    controller.current = new AbortController();
    upload.mutate(
      { sourceId, file, rightsConfirmed: true, signal: controller.current.signal },
      {
        onSuccess: (result) => {
          setNotice(result.duplicate ? `${file.name} was already uploaded to this source; nothing new was stored.` : `${file.name} was uploaded.`);
          setFile(null);
          setConfirmed(false);
          setTried(false);
          if (inputRef.current) inputRef.current.value = '';
        },
      },
    );
  };

  const cancelled = upload.error instanceof DOMException && upload.error.name === 'AbortError';
  const problem = upload.isError && !cancelled ? uploadProblem(upload.error) : null;

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Upload a facsimile" className="space-y-4">
      <div>
        <label htmlFor={`${sourceId}-file`} className="block text-sm font-medium text-ink">
          Facsimile file
        </label>
        <p id={`${sourceId}-file-hint`} className="mt-1 text-sm text-ink-muted">
          A PDF of the whole document, or an image of a page.
        </p>
        <input
          ref={inputRef}
          id={`${sourceId}-file`}
          type="file"
          accept={accepted}
          aria-invalid={fileError ? true : undefined}
          aria-describedby={[`${sourceId}-file-hint`, fileError ? `${sourceId}-file-error` : ''].filter(Boolean).join(' ')}
          onChange={(event) => setFile(event.target.files?.[0] ?? null)}
          className="mt-1 block w-full text-sm file:mr-3 file:rounded-soft file:border file:border-rule-strong file:bg-paper-raised file:px-3 file:py-1.5 file:text-ink"
        />
        {file && (
          <p className="figures mt-1 text-sm text-ink-muted">
            {file.name} · {sizeLabel(file.size)}
          </p>
        )}
        <FieldError id={fileError ? `${sourceId}-file-error` : undefined} message={fileError} />
      </div>
      <Checkbox
        label="I confirm I may share this facsimile under the rights statement"
        hint={rightsStatement ? `Rights statement: “${rightsStatement}”` : 'This source has no rights statement yet; add one when you edit it.'}
        checked={confirmed}
        onChange={(event) => setConfirmed(event.target.checked)}
        error={confirmError}
      />
      {upload.isPending && (
        <ProgressBar
          label={`Uploading ${upload.variables?.file.name ?? ''}`}
          value={upload.progress === null ? null : upload.progress * 100}
          valueText={upload.progress !== null && upload.progress >= 1 ? 'Checking the file…' : undefined}
        />
      )}
      {problem && (
        <Alert tone="danger" title={problem.title}>
          {problem.message}
        </Alert>
      )}
      <div aria-live="polite" className="text-sm text-accent-strong">
        {notice && `✓ ${notice}`}
        {cancelled && <span className="text-ink-muted">The upload was cancelled.</span>}
      </div>
      <div className="flex gap-2">
        <Button type="submit" loading={upload.isPending}>
          Upload
        </Button>
        {upload.isPending && (
          <Button variant="secondary" onClick={() => controller.current?.abort()}>
            Cancel upload
          </Button>
        )}
      </div>
    </form>
  );
}
