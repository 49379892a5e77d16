/** The Pitch & size reckoner: pure computations shared by the server routes and the client. */
export * from './errors';
export * from './notes';
export * from './pitch';
export * from './intervals';
export * from './sizes';
export * from './size-phrases';
export * from './fingering';
export * from './calendar';
export { QUALIFIED_DATE_MARGIN, ladyDayEnvelope, type Reading, type YearStart } from './date-bounds';
export { EDTF_FORMS, parseEdtf, isSingleDay, type ParsedEdtf, type EdtfNode } from './edtf-tree';
export * from './dates';
export * from './schemas';
