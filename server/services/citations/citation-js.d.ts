/** Minimal declarations for citation-js 0.7, which ships no TypeScript types. */
declare module '@citation-js/core' {
  export class Cite {
    constructor(data?: unknown, options?: Record<string, unknown>);
    data: Record<string, unknown>[];
    format(format: string, options?: Record<string, unknown>): string;
  }
  export const plugins: {
    config: { get(name: string): any };
    input: { chain(data: unknown, options?: Record<string, unknown>): Record<string, unknown>[] };
  };
  export const util: Record<string, unknown>;
}
declare module '@citation-js/plugin-bibtex';
declare module '@citation-js/plugin-ris';
declare module '@citation-js/plugin-csl';
