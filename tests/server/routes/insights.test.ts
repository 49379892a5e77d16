import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import type { InsightsResponse } from '@shared/insights/schema';
import { anonymous, createUser, signedIn } from '../../support/http';
import { buildExcerpt, buildSource } from '../../support/factories';

type Client = Awaited<ReturnType<typeof anonymous>>;

let visitor: Client;
let editor: Client;
const ids: Record<string, string> = {};

const insights = async (client: Client, query = ''): Promise<InsightsResponse> =>
  (await client.get(`/api/insights${query ? `?${query}` : ''}`).expect(200)).body;
const spanIds = (r: InsightsResponse) => r.timeline.spans.map((s) => s.excerptId).sort();

/** The factories write rows only; queue every source for the search index and drain the outbox. */
async function indexEverything() {
  const { SearchOutbox, Source } = await import('@server/models');
  const { drainOnce } = await import('@search/outbox-worker');
  for (const source of await Source.findAll({ attributes: ['id'] })) {
    await SearchOutbox.create({ entityType: 'source', entityId: source.id, operation: 'upsert', availableAt: new Date(), lastError: null });
  }
  for (;;) {
    const r = await drainOnce();
    expect(r.error).toBeUndefined();
    if (r.synced === 0 && !r.busy) break;
  }
}

beforeAll(async () => {
  const contributor = await createUser('contributor');
  const inventory = await buildSource(contributor.id, { dateEdtf: '1702' });
  ids.alto = (await buildExcerpt(inventory, { sizeSlug: 'alto', aHz: 415 })).publicId;
  ids.tenor = (await buildExcerpt(inventory, { sizeSlug: 'tenor', term: 'Tenor', aHz: 392, locatorValue: '13r' })).publicId;
  ids.draftExcerpt = (await buildExcerpt(inventory, { status: 'draft', sizeSlug: 'bass', term: 'Bassflöte', locatorValue: '14r' })).publicId;
  const treatise = await buildSource(contributor.id, { title: 'A fictional treatise', sourceType: 'treatise', dateEdtf: '1690/1710', languages: ['fr'] });
  ids.voice = (await buildExcerpt(treatise, { sizeSlug: 'voice-flute', term: 'flûte de voix', diplomatic: 'La flûte de voix joue avec les hautbois.', aHz: 440, locatorType: 'page', locatorValue: '9' })).publicId;
  const early = await buildSource(contributor.id, { title: 'An early account (fictional)', sourceType: 'account', dateEdtf: '1552~' });
  ids.early = (await buildExcerpt(early, { sizeSlug: 'bass', term: 'basse', aHz: 466 })).publicId;
  const draft = await buildSource(contributor.id, { title: 'A draft letter', sourceType: 'letter', status: 'draft', dateEdtf: '1720' });
  ids.draftSource = (await buildExcerpt(draft, { status: 'draft', sizeSlug: 'alto' })).publicId;
  await indexEverything();
  visitor = await anonymous();
  editor = (await signedIn('editor')).client;
});

describe('GET /api/insights', () => {
  it('counts excerpts per decade exactly as the database does (approved material only)', async () => {
    const { getSequelize } = await import('@server/db');
    const rows = await getSequelize().query<{ decade: number; n: number }>(
      `WITH dated AS (
         SELECT e.id, YEAR(COALESCE(e.date_earliest, s.date_earliest)) AS y0, YEAR(COALESCE(e.date_latest, s.date_latest)) AS y1
           FROM excerpts e JOIN sources s ON s.id = e.source_id
          WHERE e.status = 'approved' AND s.status = 'approved'),
       decades AS (SELECT 1500 + 10 * seq AS decade FROM seq_0_to_29)
       SELECT d.decade, COUNT(x.id) AS n FROM decades d
         LEFT JOIN dated x ON x.y0 < d.decade + 10 AND x.y1 >= d.decade AND FLOOR(x.y1 / 10) - FLOOR(x.y0 / 10) < 40
        GROUP BY d.decade ORDER BY d.decade`,
      { type: QueryTypes.SELECT },
    );
    const expected = rows.map((r) => ({ decade: Number(r.decade), count: Number(r.n) }));
    const res = await insights(visitor);
    expect(res.timeline.decades).toEqual(expected);
    expect(res.timeline.decades).toHaveLength(30);
    // 1690/1710 touches the 1690s, 1700s and 1710s; the two 1702 excerpts count in the 1700s.
    expect(res.timeline.decades.find((d) => d.decade === 1700)?.count).toBe(3);
    expect(res.total).toBe(4);
  });

  it('draws each excerpt as a span, marking ranges and qualified dates as approximate', async () => {
    const res = await insights(visitor);
    expect(res.timeline.truncated).toBe(false);
    expect(res.timeline.spans.map((s) => s.excerptId)[0]).toBe(ids.early);
    const voice = res.timeline.spans.find((s) => s.excerptId === ids.voice)!;
    expect(voice).toMatchObject({ yearEarliest: 1690, yearLatest: 1710, sizes: ['voice-flute'], sourceTitle: 'A fictional treatise', approximate: true });
    expect(res.timeline.spans.find((s) => s.excerptId === ids.alto)).toMatchObject({ yearEarliest: 1702, yearLatest: 1702, approximate: false });
    expect(res.timeline.spans.find((s) => s.excerptId === ids.early)?.approximate).toBe(true);
  });

  it('places a′ at the midpoint year with cents from 440 Hz', async () => {
    const res = await insights(visitor);
    const byId = Object.fromEntries(res.pitch.points.map((p) => [p.excerptId, p]));
    expect(byId[ids.voice]).toMatchObject({ year: 1700, aHz: 440, cents: 0 });
    // Cents after Ellis (1885): 1200 · log2(415/440) = −101.3; 1200 · log2(392/440) = −200.0 (to one decimal).
    expect(byId[ids.alto]).toMatchObject({ year: 1702, aHz: 415, cents: -101.3 });
    expect(byId[ids.tenor].cents).toBe(-200);
    expect(res.pitch.points).toHaveLength(4);
  });

  it('never shows a draft to an anonymous visitor; an editor sees it', async () => {
    const anon = await insights(visitor);
    expect(spanIds(anon)).toEqual([ids.alto, ids.tenor, ids.voice, ids.early].sort());
    expect(JSON.stringify(anon)).not.toContain(ids.draftSource);
    expect(JSON.stringify(anon)).not.toContain(ids.draftExcerpt);
    const all = await insights(editor);
    expect(spanIds(all)).toContain(ids.draftSource);
    expect(spanIds(all)).toContain(ids.draftExcerpt);
    expect(all.total).toBe(6);
    const home = await insights(editor, 'scope=public');
    expect(spanIds(home)).toEqual(spanIds(anon));
  });

  it('follows the search filters', async () => {
    expect(spanIds(await insights(visitor, 'size=tenor'))).toEqual([ids.tenor]);
    expect(spanIds(await insights(visitor, 'type=treatise,account'))).toEqual([ids.voice, ids.early].sort());
    const nineties = await insights(visitor, 'from=1690&to=1699');
    expect(spanIds(nineties)).toEqual([ids.voice]);
    expect(nineties.total).toBe(1);
    const low = await insights(visitor, 'aMax=400');
    expect(low.pitch.points.map((p) => p.aHz)).toEqual([392]);
    expect(spanIds(await insights(visitor, 'q=hautbois'))).toEqual([ids.voice]);
  });

  it('answers a bad parameter with a 400 naming it', async () => {
    const bad = await visitor.get('/api/insights?from=soon').expect(400);
    expect(bad.body.error.code).toBe('validation_failed');
    expect(Object.keys(bad.body.error.fields)).toEqual(['from']);
    const unknown = await visitor.get('/api/insights?page=2').expect(400);
    expect(unknown.body.error.fields).toHaveProperty('page');
    const size = await visitor.get('/api/insights?size=%22%20OR%20visibility%20%3D%20%22draft').expect(400);
    expect(Object.keys(size.body.error.fields)).toEqual(['size.0']);
    const order = await visitor.get('/api/insights?from=1750&to=1700').expect(400);
    expect(order.body.error.fields).toHaveProperty('to');
  });
});
