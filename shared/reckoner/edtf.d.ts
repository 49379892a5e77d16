/** Minimal types for edtf 4.11 (the package ships none); only what the reckoner uses. */
declare module 'edtf' {
  interface EdtfObject {
    readonly type: string;
    readonly min: number;
    readonly max: number;
    toEDTF(): string;
  }
  /** The raw parse tree: values as written (month 0-based), qualifiers as booleans or bitmasks. */
  export function parse(input: string, options?: { level?: number; types?: string[] }): unknown;
  export default function edtf(input: string | object): EdtfObject;
}
