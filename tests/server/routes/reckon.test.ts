import { describe, it, expect } from 'vitest';
import { anonymous } from '../../support/http';

describe('GET /api/reckon/sounding', () => {
  it('answers the contract example: a D-size (voice flute) at a′ = 415 Hz', async () => {
    const client = await anonymous();
    const res = await client.get('/api/reckon/sounding?size=voice-flute&a=415').expect(200);
    // product.md contract example; CP: a D-nominal recorder at 415 sounds about C♯ at modern pitch (−101.3 cents).
    expect(res.body).toEqual({ nominal: 'D4', frequencyHz: 276.98, nearest: { note: 'C#4', cents: -1.3 }, centsFromModern: -101.3 });
  });

  it('gives a′ itself at 440 for an alto: F4 = 349.23 Hz', async () => {
    const res = await (await anonymous()).get('/api/reckon/sounding?size=alto&a=440').expect(200);
    // Suits, MTU "Frequencies for equal-tempered scale, A4 = 440 Hz": F4 349.23.
    expect(res.body.frequencyHz).toBe(349.23);
    expect(res.body.nearest).toEqual({ note: 'F4', cents: 0 });
  });

  it.each([
    ['size=oboe&a=415', 'size'],
    ['size=alto&a=600', 'a'],
    ['size=alto&a=abc', 'a'],
    ['size=alto', 'a'],
  ])('answers 400 naming the parameter for %s', async (query, field) => {
    const res = await (await anonymous()).get(`/api/reckon/sounding?${query}`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toBeTruthy();
  });
});

describe('GET /api/reckon/fingering', () => {
  it('adds three flats for a D-size read with F fingerings (CP)', async () => {
    const res = await (await anonymous()).get('/api/reckon/fingering?size=voice-flute&key=D%20major&fingering=F').expect(200);
    // CP (references.md): read with alto (F) fingerings a D-size part is fingered a minor third up: D major → F major.
    expect(res.body).toEqual({ fingeringKey: 'F major', keySignature: -1, soundingKeySignature: 2 });
  });

  it('adds two flats for a D-size read with C fingerings (CP)', async () => {
    const res = await (await anonymous()).get('/api/reckon/fingering?size=voice-flute&key=B%20minor&fingering=C').expect(200);
    // CP: with C fingerings a D-size part is fingered a major second down: B minor (2♯) → A minor (0).
    expect(res.body).toEqual({ fingeringKey: 'A minor', keySignature: 0, soundingKeySignature: 2 });
  });

  it('answers 400 for an unreadable key or fingering', async () => {
    const client = await anonymous();
    expect((await client.get('/api/reckon/fingering?size=alto&key=H%20dorian&fingering=F')).body.error.fields.key).toBeTruthy();
    expect((await client.get('/api/reckon/fingering?size=alto&key=F%20major&fingering=G')).body.error.fields.fingering).toBeTruthy();
  });
});

describe('GET /api/reckon/date', () => {
  it('reads a Lady-Day year in the Julian calendar: 10 February 1700/01', async () => {
    const res = await (await anonymous())
      .get('/api/reckon/date?value=1700-02-10&calendar=julian&yearStart=mar25')
      .expect(200);
    // Calendar (New Style) Act 1750: 10 February 1700 written under a 25 March year start is 1701 in modern numbering;
    // from 29 February 1700 (Julian) the Julian–Gregorian difference is 11 days → 21 February 1701 (Gregorian).
    expect(res.body.gregorian).toBe('1701-02-21');
    expect(res.body.edtf).toBe('1701-02-21');
    expect(res.body.earliest).toBe('1701-02-21');
    expect(res.body.latest).toBe('1701-02-21');
  });

  it('gives the Julian Day at 0h for a Gregorian day', async () => {
    const res = await (await anonymous()).get('/api/reckon/date?value=1957-10-04').expect(200);
    // Meeus, Astronomical Algorithms 2nd ed., ch. 7, example 7.a: 1957 October 4.81 → JD 2436116.31, so 0h is 2436115.5.
    expect(res.body.julianDay).toBe(2436115.5);
  });

  it('labels an approximate year and a decade', async () => {
    const client = await anonymous();
    expect((await client.get('/api/reckon/date?value=1700~')).body.label).toBe('c. 1700');
    // LoC EDTF specification (2019), level 1 unspecified digits: 169X is the 1690s.
    const decade = (await client.get('/api/reckon/date?value=169X')).body;
    expect(decade).toMatchObject({ label: '1690s', earliest: '1690-01-01', latest: '1699-12-31' });
  });

  it('refuses 29 February 1700 in the Gregorian calendar instead of moving it to 1 March', async () => {
    const res = await (await anonymous()).get('/api/reckon/date?value=1700-02-29');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.value).toMatch(/1700/);
  });
});
