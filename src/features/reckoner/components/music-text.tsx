import { musicGlyphs, musicWords, signatureText, spokenSignature } from '../lib/format';

/** A note or key with ♯/♭ glyphs on screen and spelled-out accidentals for screen readers. */
export function MusicText({ children }: { children: string }) {
  const glyphs = musicGlyphs(children);
  if (glyphs === children) return <>{children}</>;
  return (
    <>
      <span aria-hidden="true">{glyphs}</span>
      <span className="sr-only">{musicWords(children)}</span>
    </>
  );
}

/** A key signature as a count ("3♭", "2♯", "none"), read out as "3 flats". */
export function KeySignature({ count }: { count: number }) {
  return (
    <span className="figures">
      <span aria-hidden="true">{signatureText(count)}</span>
      <span className="sr-only">{spokenSignature(count)}</span>
    </span>
  );
}
