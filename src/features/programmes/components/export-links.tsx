import { exportFormats, type ExportFormat } from '@shared/programmes/schema';
import { buttonClasses } from '@/components/button';

const labels: Record<ExportFormat, string> = { html: 'Print-ready HTML', docx: 'Word (.docx)', markdown: 'Markdown', bib: 'BibTeX (.bib)' };

/** Downloads of a programme: the browser's "Save as PDF" on the HTML gives a clean printed programme. */
export function ExportLinks({ urlFor }: { urlFor: (format: ExportFormat) => string }) {
  return (
    <div className="flex flex-wrap gap-2">
      {exportFormats.map((f) => (
        <a key={f} className={buttonClasses('secondary', 'sm')} href={urlFor(f)} download>{labels[f]}</a>
      ))}
    </div>
  );
}
