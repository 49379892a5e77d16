export { CitePanel, type CitePanelProps } from './components/cite-panel';
export { ExportResultsButton, type ExportResultsButtonProps } from './components/export-results-button';
