import { publicUrl } from '../config';

/** The stable address of one version of a source or excerpt, which citations and exports name. */
export function permalink(kind: 'sources' | 'excerpts', publicId: string, version: number): string {
  return `${publicUrl()}/${kind}/${publicId}/v/${version}`;
}
