/** The citation service: styles, loading citable material, and every export format. */
export { listStyles, listStylesJson, useStyle, registerDefaultStyles, WINDWAY_STYLES } from './styles';
export { formatCitations, toBibtex, toRis, type Citable, type FormatResult } from './format';
export { renderClusters, parseBibliographic, LOCALE, type Cluster } from './engine';
export { findCitable, findCitables, loadCitable, toCitable, cslOptions, type CitableTarget } from './load';
