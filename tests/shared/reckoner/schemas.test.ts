import { describe, it, expect } from 'vitest';
import { reckonDateQuerySchema, reckonFingeringQuerySchema, reckonSoundingQuerySchema } from '@shared/reckoner';

/** First issue message for a failing parse, to check that messages say what is accepted. */
function messageFor(result: { success: boolean; error?: { issues: Array<{ message: string; path: PropertyKey[] }> } }, field: string): string {
  expect(result.success).toBe(false);
  const issue = result.error!.issues.find((i) => i.path[0] === field);
  expect(issue).toBeDefined();
  return issue!.message;
}

describe('reckonSoundingQuerySchema', () => {
  it('accepts a slug and coerces a′ from the query string', () => {
    expect(reckonSoundingQuerySchema.parse({ size: 'voice-flute', a: '415' })).toEqual({ size: 'voice-flute', a: 415 });
  });

  it('names the accepted sizes and the a′ range', () => {
    expect(messageFor(reckonSoundingQuerySchema.safeParse({ size: 'kazoo', a: '415' }), 'size')).toMatch(/voice-flute/);
    expect(messageFor(reckonSoundingQuerySchema.safeParse({ size: 'alto', a: '880' }), 'a')).toMatch(/500 Hz/);
    expect(messageFor(reckonSoundingQuerySchema.safeParse({ size: 'alto', a: '300' }), 'a')).toMatch(/350 Hz/);
    expect(messageFor(reckonSoundingQuerySchema.safeParse({ size: 'alto', a: 'high' }), 'a')).toMatch(/number of hertz/);
  });
});

describe('reckonFingeringQuerySchema', () => {
  it('accepts size, key and fingering', () => {
    expect(reckonFingeringQuerySchema.parse({ size: 'voice-flute', key: ' F major ', fingering: 'C' })).toEqual({ size: 'voice-flute', key: 'F major', fingering: 'C' });
  });

  it('says fingering is C or F and asks for a key', () => {
    expect(messageFor(reckonFingeringQuerySchema.safeParse({ size: 'alto', key: 'F major', fingering: 'G' }), 'fingering')).toMatch(/C or F/);
    expect(messageFor(reckonFingeringQuerySchema.safeParse({ size: 'alto', key: '', fingering: 'C' }), 'key')).toMatch(/F major/);
  });
});

describe('reckonDateQuerySchema', () => {
  it('defaults to the Gregorian calendar and a 1 January year start', () => {
    expect(reckonDateQuerySchema.parse({ value: '1700~' })).toEqual({ value: '1700~', calendar: 'gregorian', yearStart: 'jan1' });
    expect(reckonDateQuerySchema.parse({ value: '1700-02-10', calendar: 'julian', yearStart: 'mar25' })).toMatchObject({ calendar: 'julian', yearStart: 'mar25' });
  });

  it('says which calendars and year starts are accepted', () => {
    expect(messageFor(reckonDateQuerySchema.safeParse({ value: '1700', calendar: 'french' }), 'calendar')).toMatch(/gregorian or julian/);
    expect(messageFor(reckonDateQuerySchema.safeParse({ value: '1700', yearStart: 'dec25' }), 'yearStart')).toMatch(/jan1 or mar25/);
    expect(messageFor(reckonDateQuerySchema.safeParse({}), 'value')).toMatch(/EDTF/);
  });
});
