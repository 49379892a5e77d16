/** Languages most sources in the archive are written in, offered as one-click choices. */
export const commonLanguages: readonly { tag: string; name: string }[] = [
  { tag: 'en', name: 'English' },
  { tag: 'fr', name: 'French' },
  { tag: 'de', name: 'German' },
  { tag: 'nl', name: 'Dutch' },
  { tag: 'it', name: 'Italian' },
  { tag: 'la', name: 'Latin' },
];

const names = (() => {
  try {
    return new Intl.DisplayNames(['en'], { type: 'language' });
  } catch {
    return null;
  }
})();

/** "French (fr)"; the tag alone when the browser cannot name it. */
export function languageName(tag: string): string {
  const known = commonLanguages.find((l) => l.tag === tag)?.name;
  let name = known;
  if (!name) {
    try {
      name = names?.of(tag);
    } catch {
      name = undefined;
    }
  }
  return name && name !== tag ? `${name} (${tag})` : tag;
}
