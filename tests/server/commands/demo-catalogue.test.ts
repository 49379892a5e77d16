import { describe, it, expect } from 'vitest';
import { Op } from 'sequelize';
import { SIZE_SLUGS } from '@shared/reckoner/sizes';

describe('seedDemo (catalogue)', () => {
  it('creates the fictional catalogue once; running it again adds nothing', async () => {
    const { seedDemo } = await import('@server/seeders/demo');
    const { Source, Excerpt, Facsimile, Revision, SearchOutbox, InstrumentMention, PitchTag } = await import('@server/models');
    const passwords = { reader: 'demo reader pass 1', contributor: 'demo contrib pass 1', editor: 'demo editor pass 1', admin: 'demo admin pass 1' };
    await seedDemo(passwords);
    const counts = async () => ({
      sources: await Source.count(),
      excerpts: await Excerpt.count(),
      facsimiles: await Facsimile.count(),
      revisions: await Revision.count(),
      outbox: await SearchOutbox.count(),
    });
    const first = await counts();
    expect(first.sources).toBe(12);
    expect(first.excerpts).toBeGreaterThanOrEqual(55);
    expect(first.facsimiles).toBe(12);
    await seedDemo(passwords);
    expect(await counts()).toEqual(first);

    // Mostly approved, with work waiting for review and a draft.
    const statuses = (await Source.findAll()).map((s) => s.status);
    expect(statuses.filter((s) => s === 'approved').length).toBeGreaterThanOrEqual(9);
    expect(statuses).toContain('submitted');
    expect(statuses).toContain('draft');
    const approved = await Source.findAll({ where: { status: 'approved' } });
    expect(approved.every((s) => s.approvedVersion === s.version)).toBe(true);
    // Every size of the vocabulary is used; pitches stay in the demo range.
    const slugs = new Set((await InstrumentMention.findAll()).map((m) => m.sizeSlug));
    expect([...slugs].sort()).toEqual([...SIZE_SLUGS].sort());
    const hz = (await PitchTag.findAll()).map((t) => Number(t.aHz));
    expect(Math.min(...hz)).toBeGreaterThanOrEqual(380);
    expect(Math.max(...hz)).toBeLessThanOrEqual(470);
    expect(await Source.count({ where: { calendarNote: 'old-style' } })).toBe(1);
    expect(await Source.count({ where: { rightsStatement: { [Op.like]: 'Fictional demo material%' } } })).toBe(12);
    // The facsimiles are really stored.
    const { getFileStore } = await import('@server/storage/file-store');
    for (const f of await Facsimile.findAll()) expect(await getFileStore().exists(f.storageKey)).toBe(true);
  });
});
