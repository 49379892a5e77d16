import type { CitableExcerpt, CitableSource } from '@shared/citations/csl';

/** Demo data (invented; the names echo real practice only to read naturally). */
export const inventory: CitableSource = {
  publicId: 'S7K2QX9A',
  title: 'Inventarium der Instrumente der Hofkapelle',
  sourceType: 'inventory',
  creators: [{ name: 'Quellmann, Jobst Anselm', role: 'compiler' }],
  dateEdtf: '1703-05-12',
  place: 'Oderstadt',
  languages: ['de'],
  holdingInstitution: 'Fürstliches Hausarchiv Velmark, Oderstadt',
  shelfmark: 'Loc. 44/7',
  publication: null,
  version: 3,
};

export const treatise: CitableSource = {
  publicId: 'S3M8ZT4B',
  title: 'Principes de la flute traversiere, ou flute d’Allemagne; de la flute a bec, ou flute douce, et du haut-bois',
  sourceType: 'treatise',
  creators: [{ name: 'Jacques-Martin Hotteterre', role: 'author' }],
  dateEdtf: '1707',
  place: 'Paris',
  languages: ['fr'],
  holdingInstitution: 'Bibliothèque nationale de France, Paris',
  shelfmark: 'VM8 F-1',
  publication: { publisher: 'Christophe Ballard', place: 'Paris', edition: null },
  version: 1,
};

export const folioExcerpt: CitableExcerpt = { publicId: 'E4R9WD2C', locatorType: 'folio', locatorValue: '12v', version: 2 };

export const options = { publicUrl: 'https://windway.example', accessed: new Date('2025-03-01T12:00:00Z') };
