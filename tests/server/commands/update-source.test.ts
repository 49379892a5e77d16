import { describe, it, expect } from 'vitest';
import { createUser } from '../../support/http';
import { buildSource } from '../../fixtures/catalogue';

async function setup() {
  const user = await createUser('contributor');
  const actor = { id: user.id, role: user.role, displayName: user.displayName, email: user.email };
  const { createSource } = await import('@server/commands/create-source');
  const { createSourceSchema } = await import('@shared/catalogue/schemas');
  const source = await createSource(actor, createSourceSchema.parse(buildSource()));
  return { actor, source };
}

describe('updateSource', () => {
  it('rolls the whole change back when its revision cannot be written (one transaction)', async () => {
    const { actor, source } = await setup();
    const { Revision, SearchOutbox, Source } = await import('@server/models');
    // Occupy version 2 in the history so recording the revision fails (unique entity/version).
    await Revision.create({ entityType: 'source', entityId: source.id, version: 2, snapshot: {}, authorId: actor.id, reason: 'blocker' });
    const outboxBefore = await SearchOutbox.count({ where: { entityType: 'source', entityId: source.id } });
    const { updateSource } = await import('@server/commands/update-source');
    await expect(updateSource(actor, source.publicId, { version: 1, title: 'Never saved' })).rejects.toThrow();
    const after = (await Source.findByPk(source.id))!;
    expect(after.title).toBe(source.title);
    expect(after.version).toBe(1);
    expect(await SearchOutbox.count({ where: { entityType: 'source', entityId: source.id } })).toBe(outboxBefore);
  });

  it('refuses an empty change', async () => {
    const { actor, source } = await setup();
    const { updateSource } = await import('@server/commands/update-source');
    await expect(updateSource(actor, source.publicId, { version: 1 })).rejects.toMatchObject({ status: 400 });
  });
});

describe('submitSource', () => {
  it('runs afterSubmit hooks with { source, excerpts } once committed, and survives a failing hook', async () => {
    const { actor, source } = await setup();
    const { createExcerpt } = await import('@server/commands/create-excerpt');
    const { createExcerptSchema } = await import('@shared/catalogue/schemas');
    const { buildExcerpt } = await import('../../fixtures/catalogue');
    await createExcerpt(actor, source.publicId, createExcerptSchema.parse(buildExcerpt()));
    const { afterSubmit, submitSource } = await import('@server/commands/submit-source');
    const seen: string[] = [];
    const hook = async ({ source: s, excerpts }: { source: { publicId: string; status: string }; excerpts: unknown[] }) => {
      seen.push(`${s.publicId}:${s.status}:${excerpts.length}`);
      throw new Error('mail server down');
    };
    afterSubmit.push(hook as never);
    try {
      const result = await submitSource(actor, source.publicId);
      expect(result.source.status).toBe('submitted');
    } finally {
      afterSubmit.splice(afterSubmit.indexOf(hook as never), 1);
    }
    expect(seen).toEqual([`${source.publicId}:submitted:1`]);
  });
});
