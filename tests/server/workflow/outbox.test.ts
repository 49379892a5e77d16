import { describe, it, expect } from 'vitest';
import { anonymous } from '../../support/http';
import { waitForMail } from '../../support/mail';
import { actor } from './support';

describe('GET /api/admin/outbox', () => {
  it('lists captured messages newest first, to admins only', async () => {
    const admin = await actor('admin');
    const editor = await actor('editor');
    const email = `invitee-${Date.now()}@example.test`;
    await admin.client.post('/api/users/invitations', { email, displayName: 'Invited Person', role: 'contributor' }).expect(201);
    await waitForMail(email, /invites you to Windway/);

    const res = await admin.client.get('/api/admin/outbox');
    expect(res.status).toBe(200);
    const mail = res.body.data.find((m: { to: string[] }) => m.to.includes(email));
    expect(mail).toMatchObject({ subject: expect.stringMatching(/invites you/), text: expect.stringContaining('reset-password?token=') });
    const times = res.body.data.map((m: { id: string }) => m.id);
    expect([...times].sort().reverse()).toEqual(times);

    expect((await editor.client.get('/api/admin/outbox')).status).toBe(403);
    expect((await (await anonymous()).get('/api/admin/outbox')).status).toBe(401);
  });
});
