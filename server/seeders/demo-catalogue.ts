import { createHash } from 'node:crypto';
import type { SessionUser } from '../auth/passport';
import { getSequelize } from '../db';
import { Excerpt, Facsimile, Review, Source, type User } from '../models';
import { createSource } from '../commands/create-source';
import { createExcerpt } from '../commands/create-excerpt';
import { submitSource } from '../commands/submit-source';
import { lockSource, recordExcerptVersion, recordSourceVersion } from '../commands/support';
import { contentKey, getFileStore } from '../storage/file-store';
import { createExcerptSchema, createSourceSchema } from '@shared/catalogue/schemas';
import { demoSources, type DemoSource } from './demo-catalogue-data';
import { demoFacsimilePdf } from './demo-pdf';

const asActor = (user: User): SessionUser => ({ id: user.id, role: user.role, displayName: user.displayName, email: user.email });

/** The editor's approval of a submitted source and its submitted excerpts, as the review workflow records it. */
async function approve(publicId: string, editor: User): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const source = await lockSource(publicId, transaction);
    const approveOne = async (item: Source | Excerpt, kind: 'source' | 'excerpt') => {
      await Review.create({ entityType: kind, entityId: item.id, version: item.version, editorId: editor.id, decision: 'approve', comment: null, fieldComments: [] }, { transaction });
      (item as Source).set({ status: 'approved', version: item.version + 1, approvedVersion: item.version + 1 });
      await item.save({ transaction });
    };
    await approveOne(source, 'source');
    await recordSourceVersion(source, editor.id, 'Approved', transaction);
    for (const excerpt of await Excerpt.findAll({ where: { sourceId: source.id, status: 'submitted' }, transaction })) {
      await approveOne(excerpt, 'excerpt');
      await recordExcerptVersion(excerpt, source.publicId, editor.id, 'Approved', transaction);
    }
  });
}

/** A generated PDF stored through the FileStore; its text is extracted by the background job like any upload. */
async function attachFacsimile(source: Source, demo: DemoSource, uploaderId: number): Promise<void> {
  const passages = new Map<number, string[]>();
  for (const e of demo.excerpts) passages.set(e.at[2], [...(passages.get(e.at[2]) ?? []), e.text]);
  const pdf = Buffer.from(await demoFacsimilePdf({ title: demo.source.title, language: demo.source.languages[0], pages: demo.pages, passages }));
  const sha256 = createHash('sha256').update(pdf).digest('hex');
  const key = contentKey(sha256);
  const store = getFileStore();
  if (!(await store.exists(key))) await store.put(key, pdf);
  await Facsimile.create({
    sourceId: source.id, storageKey: key, originalName: `${source.publicId}-facsimile.pdf`, mediaType: 'application/pdf', byteSize: pdf.length, sha256,
    pageCount: demo.pages, extractionStatus: 'pending', extractionProgress: 0, extractionError: null, pageTexts: null, rightsConfirmedAt: new Date(), uploadedById: uploaderId,
  });
}

/**
 * The fictional demo catalogue, written through the same commands as the API (revisions,
 * outbox rows), then approved as an editor would. Idempotent: a source whose title the demo
 * contributor already has is skipped.
 */
export async function seedDemoCatalogue(people: { contributor: User; editor: User }, log: (line: string) => void = () => {}): Promise<number> {
  const actor = asActor(people.contributor);
  let created = 0;
  for (const demo of demoSources) {
    if (await Source.findOne({ where: { title: demo.source.title, contributorId: people.contributor.id } })) continue;
    const source = await createSource(actor, createSourceSchema.parse(demo.source));
    for (const e of demo.excerpts) {
      const [locatorType, locatorValue, facsimilePage] = e.at;
      const input = createExcerptSchema.parse({
        locatorType, locatorValue, facsimilePage, diplomatic: e.text,
        translation: e.translation ?? null, translationLanguage: e.translation ? 'en' : null, translator: e.translation ? people.contributor.displayName : null,
        commentary: e.commentary ?? null, dateEdtf: e.date ?? null,
        mentions: e.mentions.map(([term, language, sizeSlug, certainty]) => ({ term, language, sizeSlug, certainty: certainty ?? 'probable' })),
        pitchTags: (e.pitch ?? []).map(([statement, aHz, derivation]) => ({ statement, aHz, derivation })),
      });
      await createExcerpt(actor, source.publicId, input);
    }
    await attachFacsimile(source, demo, people.contributor.id);
    if (demo.state !== 'draft') await submitSource(actor, source.publicId);
    if (demo.state === 'approved') await approve(source.publicId, people.editor);
    created += 1;
  }
  if (created > 0) log(`Created ${created} fictional demo sources with excerpts and facsimiles`);
  return created;
}
