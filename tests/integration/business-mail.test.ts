// E-mail through the outbox against the local SMTP sink: retries on a refusing or dead mail
// server (never lost silently), the owner-only dev inbox, the crew's plan and the supplier's order,
// and team invitations that end in a working sign-in.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as devMail } from '@/app/api/dev/mail/route';
import { POST as retryRoute } from '@/app/api/dev/mail/retry/route';
import { POST as acceptInvite } from '@/app/api/invitations/[token]/route';
import { POST as invite } from '@/app/api/invitations/route';
import { POST as jobMail } from '@/app/api/jobs/[id]/mail/route';
import { bdb } from '@/lib/server/businessDb';
import { MAX_ATTEMPTS, queueMail, retryDue, type OutboxItem } from '@/lib/server/mail';
import { verifyCredentials } from '@/lib/server/users';
import { demoUser, json, params, request } from './helpers';
import { freshJob, startBusinessFakes } from './business-setup';

let env: Awaited<ReturnType<typeof startBusinessFakes>>;
let firmId: string;

const control = (body: unknown) =>
  fetch(`${env.sinkUrl}/control`, { method: 'POST', body: JSON.stringify(body) });
const sinkFor = async (to: string) =>
  (await (await fetch(`${env.sinkUrl}/messages?to=${encodeURIComponent(to)}`)).json()).items as {
    id: string;
    subject: string;
    text: string;
    attachments: { filename: string; contentType: string }[];
  }[];

beforeAll(async () => {
  env = await startBusinessFakes();
  firmId = (await demoUser('owner')).firmId;
});
afterAll(async () => {
  await env?.stop();
});

describe('the outbox', () => {
  it('retries a message the mail server refused until it goes, counting the attempts', async () => {
    await control({ rejectNext: 2 });
    const m = await queueMail({
      firmId,
      kind: 'other',
      to: 'retry.test@example.com',
      subject: 'Retry me',
      text: 'Hello',
    });
    expect(m.status).toBe('retrying');
    expect(m.attempts).toBe(1);
    expect(m.lastError).toMatch(/451|refuse/i);
    const sweep = async () =>
      json<{ tried: number; sent: number }>(
        await retryRoute(await request('POST', '/api/dev/mail/retry', { as: 'owner', body: {} })),
      );
    await sweep();
    await m.reload();
    expect(m).toMatchObject({ status: 'retrying', attempts: 2 });
    await sweep();
    await m.reload();
    expect(m).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
    expect((await sinkFor('retry.test@example.com')).map((x) => x.subject)).toEqual(['Retry me']);
  });

  it('a dead mail server: the message ends failed and visible, then goes when sent again', async () => {
    const good = process.env.SMTP_URL;
    process.env.SMTP_URL = 'smtp://127.0.0.1:9'; // nothing listens on the discard port here
    try {
      const m = await queueMail({
        firmId,
        kind: 'other',
        to: 'dead.test@example.com',
        subject: 'Dead server',
        text: 'Hello',
      });
      expect(m.status).toBe('retrying');
      for (let i = 1; i < MAX_ATTEMPTS; i += 1) await retryDue(50);
      await m.reload();
      expect(m.status).toBe('failed');
      expect(m.attempts).toBe(MAX_ATTEMPTS);
      const listed = await json<{ outbox: OutboxItem[] }>(
        await devMail(await request('GET', '/api/dev/mail', { as: 'owner' })),
      );
      const row = listed.outbox.find((o) => o.id === m.id)!;
      expect(row).toMatchObject({ status: 'failed', attempts: MAX_ATTEMPTS });
      expect(row.lastError).toBeTruthy();
      // A failed message is not retried by the sweep on its own...
      await retryDue(50);
      await m.reload();
      expect(m.status).toBe('failed');
    } finally {
      process.env.SMTP_URL = good;
    }
    // ...but the owner can send it again once the server is back.
    const failed = await bdb().models.EmailMessage.findOne({
      where: { toAddress: 'dead.test@example.com' },
    });
    const again = await retryRoute(
      await request('POST', '/api/dev/mail/retry', { as: 'owner', body: { id: failed!.id } }),
    );
    expect(await json(again)).toMatchObject({ status: 'sent' });
  });

  it('only the owner reads the firm’s mail, and only their own firm’s', async () => {
    expect((await devMail(await request('GET', '/api/dev/mail', { as: 'crew' }))).status).toBe(403);
    expect((await devMail(await request('GET', '/api/dev/mail', { as: 'designer' }))).status).toBe(
      403,
    );
    const mine = await json<{ inbox: { items: { subject: string }[] } }>(
      await devMail(await request('GET', '/api/dev/mail', { as: 'owner' })),
    );
    expect(mine.inbox.items.map((i) => i.subject)).toContain('Retry me');
    const theirs = await json<{ inbox: { items: { subject: string }[] } }>(
      await devMail(await request('GET', '/api/dev/mail', { as: 'otherOwner' })),
    );
    expect(theirs.inbox.items.map((i) => i.subject)).not.toContain('Retry me');
  });
});

describe('paperwork', () => {
  it('sends the framing plan and cut list to the crew and the order CSV to a supplier', async () => {
    const { jobId, designId } = await freshJob('designer');
    const plan = await jobMail(
      await request('POST', `/api/jobs/${jobId}/mail`, {
        as: 'designer',
        body: { kind: 'plan', designId },
      }),
      params(jobId),
    );
    expect(plan.status).toBe(200);
    const crewMail = (await sinkFor('crew@larchfield.example'))[0];
    expect(crewMail.subject).toMatch(/Framing plan and cut list/);
    expect(crewMail.attachments.map((a) => a.contentType).sort()).toEqual([
      'application/pdf',
      'text/csv',
    ]);
    const order = await jobMail(
      await request('POST', `/api/jobs/${jobId}/mail`, {
        as: 'designer',
        body: { kind: 'order', designId, to: ['orders@timber-merchant.example'] },
      }),
      params(jobId),
    );
    expect(order.status).toBe(200);
    const supplier = (await sinkFor('orders@timber-merchant.example'))[0];
    expect(supplier.attachments).toEqual([
      expect.objectContaining({
        contentType: 'text/csv',
        filename: expect.stringMatching(/^materials-.*\.csv$/),
      }),
    ]);
    const crewTry = await jobMail(
      await request('POST', `/api/jobs/${jobId}/mail`, {
        as: 'crew',
        body: { kind: 'order', designId, to: ['x@example.com'] },
      }),
      params(jobId),
    );
    expect(crewTry.status).toBe(403);
  });
});

describe('team invitations', () => {
  it('the owner invites a crew member, who sets a password from the link and can sign in', async () => {
    const email = `new.crew.${Date.now()}@larchfield.example`;
    expect(
      (
        await invite(
          await request('POST', '/api/invitations', {
            as: 'designer',
            body: { email, name: 'New Crew', role: 'crew' },
          }),
        )
      ).status,
    ).toBe(403);
    const res = await invite(
      await request('POST', '/api/invitations', {
        as: 'owner',
        body: { email, name: 'New Crew', role: 'crew' },
      }),
    );
    expect(res.status).toBe(201);
    const mail = (await sinkFor(email))[0];
    const token = /\/invite\/([A-Za-z0-9_-]{43})/.exec(mail.text)![1];
    const tokenCtx = { params: Promise.resolve({ token }) };
    const weak = await acceptInvite(
      await request('POST', '/x', { body: { password: 'short', confirm: 'short' } }),
      tokenCtx,
    );
    expect(weak.status).toBe(400);
    const ok = await acceptInvite(
      await request('POST', '/x', {
        body: { password: 'a-long-password-1', confirm: 'a-long-password-1' },
      }),
      { params: Promise.resolve({ token }) },
    );
    expect(ok.status).toBe(201);
    const user = await verifyCredentials(email, 'a-long-password-1');
    expect(user).toMatchObject({ role: 'crew', firmId });
    const twice = await acceptInvite(
      await request('POST', '/x', {
        body: { password: 'another-password-2', confirm: 'another-password-2' },
      }),
      { params: Promise.resolve({ token }) },
    );
    expect(twice.status).toBe(409);
    const forged = await acceptInvite(
      await request('POST', '/x', {
        body: { password: 'a-long-password-1', confirm: 'a-long-password-1' },
      }),
      { params: Promise.resolve({ token: token.replace(/^./, token[0] === 'A' ? 'B' : 'A') }) },
    );
    expect(forged.status).toBe(404);
  });
});
