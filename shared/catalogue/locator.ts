import type { LocatorType } from './vocabulary';

/**
 * What a locator value looks like for each type, e.g. folio `12v`, signature `B3v`.
 * A range joins two values with a hyphen or en dash (`12v–13r`).
 */
const single: Record<LocatorType, RegExp> = {
  page: /^(\d{1,5}|[ivxlcdm]{1,10})$/i,
  folio: /^\d{1,4}[rv]$/,
  signature: /^[A-Z]{1,3}[1-9]\d?[rv]?$|^[*†¶§][1-9]?[rv]?$/i,
  column: /^\d{1,5}[ab]?$/,
  plate: /^(\d{1,4}|[IVXLC]{1,8})$/,
};

export const locatorExamples: Record<LocatorType, string> = {
  page: '23, xiv',
  folio: '12v, 3r',
  signature: 'B3v, A2',
  column: '145, 145b',
  plate: '7, IV',
};

export const locatorLabels: Record<LocatorType, { singular: string; plural: string; abbreviation: string }> = {
  page: { singular: 'page', plural: 'pages', abbreviation: 'p.' },
  folio: { singular: 'folio', plural: 'folios', abbreviation: 'fol.' },
  signature: { singular: 'signature', plural: 'signatures', abbreviation: 'sig.' },
  column: { singular: 'column', plural: 'columns', abbreviation: 'col.' },
  plate: { singular: 'plate', plural: 'plates', abbreviation: 'pl.' },
};

export function isValidLocator(type: LocatorType, value: string): boolean {
  const parts = value.trim().split(/\s*[-–]\s*/);
  if (parts.length > 2) return false;
  return parts.every((part) => single[type].test(part));
}

export function locatorMessage(type: LocatorType): string {
  return `Write a ${type} as in ${locatorExamples[type]}; a range joins two with a dash (e.g. 12v–13r).`;
}

/** `fol. 12v`, `pp. 23–24`: the form a citation prints (r/v without a full stop, CMOS 14.229 — from memory). */
export function formatLocator(type: LocatorType, value: string): string {
  const isRange = /[-–]/.test(value);
  const label = locatorLabels[type];
  const abbreviation = isRange && type === 'page' ? 'pp.' : isRange && type === 'folio' ? 'fols.' : label.abbreviation;
  return `${abbreviation} ${value.replace(/\s*-\s*/, '–')}`;
}
