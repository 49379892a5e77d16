import { fileExtensions, type CiteFormat } from '@shared/citations/api';

const mediaTypes: Record<CiteFormat, string> = {
  bibtex: 'application/x-bibtex',
  ris: 'application/x-research-info-systems',
  'csl-json': 'application/vnd.citationstyles.csl+json',
  text: 'text/plain',
  html: 'text/html',
};

/** Saves text as a file in the browser. */
export function saveText(text: string, name: string, format: CiteFormat): void {
  const blob = new Blob([text], { type: `${mediaTypes[format]};charset=utf-8` });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = `${name}.${fileExtensions[format]}`;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export async function copyText(text: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}
