import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { FacsimileView } from '@shared/catalogue/types';
import { ExtractionProgress } from '@/features/facsimiles/components/extraction-progress';
import { UploadPanel } from '@/features/facsimiles/components/upload-panel';
import { clearCsrfToken } from '@/lib/api';
import { createTestQueryClient, json, stubFetch, withQueryClient } from './support';

function facsimile(overrides: Partial<FacsimileView> = {}): FacsimileView {
  return {
    id: 31,
    sourceId: 'S7K2QX9A',
    originalName: 'hotteterre-principes.pdf',
    mediaType: 'application/pdf',
    byteSize: 2_400_000,
    sha256: 'ab'.repeat(32),
    pageCount: 40,
    extractionStatus: 'running',
    extractionProgress: 12,
    extractionError: null,
    fileUrl: '/api/facsimiles/31/file',
    uploadedBy: null,
    createdAt: '2025-01-10T09:00:00.000Z',
    ...overrides,
  };
}

/** A stand-in XMLHttpRequest: reports upload progress, then answers with the given status and body. */
function stubXhr(status: number, body: unknown) {
  const sent: { headers: Record<string, string>; form: FormData | null; url: string } = { headers: {}, form: null, url: '' };
  class FakeXhr {
    status = 0;
    responseText = '';
    upload: { onprogress: ((e: { loaded: number; total: number; lengthComputable: boolean }) => void) | null } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    onabort: (() => void) | null = null;
    open(_method: string, url: string) {
      sent.url = url;
    }
    setRequestHeader(name: string, value: string) {
      sent.headers[name] = value;
    }
    getResponseHeader(name: string) {
      return name.toLowerCase() === 'content-type' ? 'application/json' : null;
    }
    abort() {
      this.onabort?.();
    }
    send(form: FormData) {
      sent.form = form;
      setTimeout(() => this.upload.onprogress?.({ loaded: 50, total: 100, lengthComputable: true }), 5);
      setTimeout(() => {
        this.status = status;
        this.responseText = JSON.stringify(body);
        this.onload?.();
      }, 30);
    }
  }
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return sent;
}

function renderWithClient(ui: React.ReactNode) {
  const Wrapper = withQueryClient(createTestQueryClient());
  return render(<Wrapper>{ui}</Wrapper>);
}

beforeEach(() => clearCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('ExtractionProgress', () => {
  it('shows progress with ARIA values and polls until extraction is done', async () => {
    let answer = facsimile();
    stubFetch(() => json({ data: answer }));
    renderWithClient(<ExtractionProgress facsimile={facsimile()} />);

    const bar = screen.getByRole('progressbar');
    expect(bar.getAttribute('aria-valuenow')).toBe('30');
    expect(bar.getAttribute('aria-valuetext')).toBe('12 of 40 pages');

    answer = facsimile({ extractionStatus: 'done', extractionProgress: 40 });
    expect(await screen.findByText(/Text extracted from 40 pages/, {}, { timeout: 3000 })).toBeTruthy();
  });
});

describe('UploadPanel', () => {
  it('asks for a file and the rights confirmation before sending', async () => {
    const sent = stubXhr(201, {});
    renderWithClient(<UploadPanel sourceId="S7K2QX9A" rightsStatement="By permission of the library" />);
    fireEvent.click(screen.getByRole('button', { name: 'Upload' }));
    expect(await screen.findByText('Choose a PDF or an image file')).toBeTruthy();
    expect(screen.getByText('Confirm that you may share this facsimile')).toBeTruthy();
    expect(sent.url).toBe('');
  });

  it('sends the file with the CSRF header and explains a 413', async () => {
    stubFetch(() => json({ user: null, csrfToken: 'tok', demo: false, mailCapture: false }));
    const sent = stubXhr(413, { error: { code: 'payload_too_large', message: 'Facsimiles may be at most 200 MB.' } });
    renderWithClient(<UploadPanel sourceId="S7K2QX9A" rightsStatement={null} />);

    const file = new File(['%PDF-1.4'], 'principes.pdf', { type: 'application/pdf' });
    fireEvent.change(screen.getByLabelText('Facsimile file'), { target: { files: [file] } });
    fireEvent.click(screen.getByLabelText('I confirm I may share this facsimile under the rights statement'));
    fireEvent.click(screen.getByRole('button', { name: 'Upload' }));

    expect(await screen.findByRole('progressbar')).toBeTruthy();
    expect(await screen.findByText('The file is too large')).toBeTruthy();
    expect(screen.getByText(/Facsimiles may be at most 200 MB/)).toBeTruthy();
    expect(sent.url).toBe('/api/sources/S7K2QX9A/facsimiles');
    expect(sent.headers['X-CSRF-Token']).toBe('tok');
    expect(sent.form?.get('rightsConfirmed')).toBe('true');
    await waitFor(() => expect(screen.queryByRole('progressbar')).toBeNull());
  });
});
