/**
 * "Quotations at hand": what "Add to programme" collected, kept per programme in this browser
 * (localStorage), so the writer sees the passages beside the notes.
 */
export interface Quotation {
  excerptId: string;
  locator: string | null;
  quotation: string | null;
  sourceTitle: string | null;
  addedAt: string;
}

const key = (programmeId: string) => `windway.quotations.${programmeId}`;

export function readQuotations(programmeId: string): Quotation[] {
  try {
    return JSON.parse(localStorage.getItem(key(programmeId)) ?? '[]') as Quotation[];
  } catch {
    return [];
  }
}

export function addQuotation(programmeId: string, quotation: Quotation): void {
  const list = readQuotations(programmeId).filter((q) => !(q.excerptId === quotation.excerptId && q.locator === quotation.locator));
  localStorage.setItem(key(programmeId), JSON.stringify([quotation, ...list].slice(0, 100)));
}

export function removeQuotation(programmeId: string, excerptId: string): void {
  localStorage.setItem(key(programmeId), JSON.stringify(readQuotations(programmeId).filter((q) => q.excerptId !== excerptId)));
}
