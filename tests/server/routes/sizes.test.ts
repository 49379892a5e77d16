import { describe, it, expect } from 'vitest';
import { anonymous, signedIn } from '../../support/http';
import { SIZE_SLUGS } from '@shared/reckoner/sizes';

describe('GET /api/sizes', () => {
  it('lists the seeded vocabulary to anyone, in order', async () => {
    const res = await (await anonymous()).get('/api/sizes');
    expect(res.status).toBe(200);
    expect(res.body.data.map((s: { slug: string }) => s.slug)).toEqual([...SIZE_SLUGS]);
    // CP, American Recorder Society (2018): the alto's lowest note is F4; Hornbostel & Sachs 1914: 421.221.12.
    expect(res.body.data.find((s: { slug: string }) => s.slug === 'alto')).toMatchObject({ nominalNote: 'F4', hornbostelSachs: '421.221.12', family: 'recorder' });
  });

  it('seeding again changes nothing and keeps editors’ changes', async () => {
    const { client } = await signedIn('editor');
    await client.patch('/api/sizes/tenor', { name: 'Tenor recorder in C' }).expect(200);
    const { seedInstrumentSizes } = await import('@server/seeders/sizes');
    expect(await seedInstrumentSizes()).toEqual([]);
    const tenor = (await client.get('/api/sizes')).body.data.find((s: { slug: string }) => s.slug === 'tenor');
    expect(tenor.name).toBe('Tenor recorder in C');
  });
});

describe('PATCH /api/sizes/:slug', () => {
  it('lets an editor change names, range and H-S number', async () => {
    const { client } = await signedIn('editor');
    const res = await client.patch('/api/sizes/voice-flute', {
      otherNames: ['voice flute', 'flûte de voix', 'flute du quatre'],
      range: { lowest: 'D4', highest: 'E6' },
      hornbostelSachs: '421.221.12',
    });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ slug: 'voice-flute', range: { lowest: 'D4', highest: 'E6' } });
    expect(res.body.data.otherNames).toContain('flute du quatre');
  });

  it('refuses a slug change, bad notes, and non-editors', async () => {
    const { client } = await signedIn('editor');
    expect((await client.patch('/api/sizes/alto', { slug: 'treble' })).body.error.fields.slug).toMatch(/Unknown field/);
    expect((await client.patch('/api/sizes/alto', { range: { lowest: 'H4', highest: 'G6' } })).body.error.fields['range.lowest']).toBeTruthy();
    expect((await client.patch('/api/sizes/alto', { range: { lowest: 'G6', highest: 'F4' } })).body.error.fields['range.highest']).toBeTruthy();
    expect((await client.patch('/api/sizes/kazoo', { name: 'x' })).status).toBe(404);
    expect((await (await signedIn('contributor')).client.patch('/api/sizes/alto', { name: 'x' })).status).toBe(403);
    expect((await (await anonymous()).patch('/api/sizes/alto', { name: 'x' })).status).toBe(401);
  });
});
