import { describe, expect, it } from 'vitest';
import { checkIds, citedKeys, markerFor, parseLocator, parseMarkers } from '@shared/programmes/markers';

// Pandoc User's Guide, "Citation syntax": [@key, locator], [@a; @b], [see @key, p. 3], [-@key].
describe('citation markers', () => {
  it('finds markers with locators, prefixes and several items', () => {
    const text = 'The voice flute [@E4R9WD2C, fol. 12v] was common [see @S7K2QX9A, pp. 3–4; @E4R9WD2C].';
    const { markers, problems } = parseMarkers(text);
    expect(problems).toEqual([]);
    expect(markers).toHaveLength(2);
    expect(markers[0]).toMatchObject({ raw: '[@E4R9WD2C, fol. 12v]', start: 16 });
    expect(markers[0].items[0]).toMatchObject({ key: 'E4R9WD2C', locator: '12v', locatorType: 'folio', prefix: '' });
    expect(markers[1].items.map((i) => i.key)).toEqual(['S7K2QX9A', 'E4R9WD2C']);
    expect(markers[1].items[0]).toMatchObject({ prefix: 'see', locator: '3–4', locatorType: 'page' });
    expect(citedKeys(parseMarkers(text))).toEqual(['E4R9WD2C', 'S7K2QX9A']);
  });

  it('takes a bare locator and a suffix', () => {
    expect(parseLocator('12v')).toEqual({ locatorType: null, locator: '12v', suffix: '' });
    expect(parseLocator('p. 33 and passim')).toEqual({ locatorType: 'page', locator: '33', suffix: 'and passim' });
    expect(parseMarkers('[@S7K2QX9A, sig. B3v]').markers[0].items[0]).toMatchObject({ locatorType: 'signature', locator: 'B3v' });
  });

  it('ignores links, e-mail addresses and escaped brackets', () => {
    expect(parseMarkers('[a link](https://x.test) [mail a@b.test] \\[@E4R9WD2C]').markers).toEqual([]);
    expect(parseMarkers('[a link](https://x.test) [mail a@b.test]').problems).toEqual([]);
  });

  it('reports malformed markers with their position', () => {
    const text = 'First line.\nAn unclosed [@E4R9WD2C, fol. 12v and more.\n\nNext [@] and [@E4R9WD2C @S7K2QX9A].';
    const { problems, markers } = parseMarkers(text);
    expect(markers).toEqual([]);
    expect(problems.map((p) => [p.kind, p.line, p.column])).toEqual([
      ['malformed', 2, 13],
      ['malformed', 4, 6],
      ['malformed', 4, 14],
    ]);
    expect(problems[0].message).toMatch(/closing bracket/);
    expect(problems[1].message).toMatch(/followed by an excerpt or source id/);
    expect(problems[2].message).toMatch(/semicolon/);
  });

  it('reports ids that are not Windway ids, and unknown ones against a known set', () => {
    const text = 'See [@doe99] and [@E4R9WD2C] and [@E0000000].';
    const parsed = parseMarkers(text);
    expect(parsed.problems).toMatchObject([{ kind: 'unknown-id', key: 'doe99' }]);
    expect(checkIds(text, parsed, new Set(['E4R9WD2C']))).toMatchObject([{ kind: 'unknown-id', key: 'E0000000', line: 1 }]);
  });

  it('writes the marker "Add to programme" inserts', () => {
    expect(markerFor('E4R9WD2C', 'fol. 12v')).toBe('[@E4R9WD2C, fol. 12v]');
    expect(markerFor('S7K2QX9A')).toBe('[@S7K2QX9A]');
  });
});
