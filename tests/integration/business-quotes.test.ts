// Quotes to paid deposit against the real database and the local Stripe and SMTP fakes: role
// rules, revisions, the signed proposal link (tampered, expired), acceptance once, and a deposit
// webhook delivered twice landing as one paid payment.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as getJob } from '@/app/api/jobs/[id]/route';
import { GET as listQuotes, POST as postQuote } from '@/app/api/jobs/[id]/quotes/route';
import { GET as getProposal, POST as answer } from '@/app/api/proposals/[token]/route';
import { POST as deposit } from '@/app/api/proposals/[token]/deposit/route';
import { GET as getQuote, PUT as putQuote } from '@/app/api/quotes/[id]/route';
import { GET as revisions } from '@/app/api/quotes/[id]/revisions/route';
import { POST as send } from '@/app/api/quotes/[id]/send/route';
import { GET as quotePdf } from '@/app/api/quotes/[id]/pdf/route';
import { POST as stripeWebhook } from '@/app/api/webhooks/stripe/route';
import { bdb } from '@/lib/server/businessDb';
import { signToken } from '@/lib/server/signedToken';
import type { QuoteView } from '@/lib/server/quotes';
import { json, params, request } from './helpers';
import { freshJob, startBusinessFakes } from './business-setup';

let env: Awaited<ReturnType<typeof startBusinessFakes>>;
let jobId: string;
let quote: QuoteView;
let token: string;

const tokenParams = (t: string) => ({ params: Promise.resolve({ token: t }) });

beforeAll(async () => {
  env = await startBusinessFakes();
  ({ jobId } = await freshJob('designer'));
});
afterAll(async () => {
  await env?.stop();
});

describe('quotes', () => {
  it('a designer quotes from the design take-off plus crew days', async () => {
    const res = await postQuote(
      await request('POST', `/api/jobs/${jobId}/quotes`, {
        as: 'designer',
        body: { labourDays: 2, crewSize: 2 },
      }),
      params(jobId),
    );
    expect(res.status).toBe(201);
    quote = await json<QuoteView>(res);
    expect(quote.status).toBe('draft');
    expect(quote.reference).toMatch(/^Q-\d{4}$/);
    const labour = quote.lines.find((l) => l.kind === 'labour')!;
    expect(labour).toMatchObject({ qty: 2, unit: 'day', labourBasis: 'days' });
    // The 6 m x 4 m starter design is laid out and taken off: joists and boards are priced lines.
    expect(quote.lines.filter((l) => l.kind === 'material').length).toBeGreaterThan(2);
    expect(quote.totals.total).toBe(quote.totals.subtotal + quote.totals.tax);
  });

  it('crew may not quote or read quotes; another firm cannot see the quote at all', async () => {
    const crewPost = await postQuote(
      await request('POST', `/api/jobs/${jobId}/quotes`, { as: 'crew', body: {} }),
      params(jobId),
    );
    expect(crewPost.status).toBe(403);
    const crewList = await listQuotes(
      await request('GET', `/api/jobs/${jobId}/quotes`, { as: 'crew' }),
      params(jobId),
    );
    expect(crewList.status).toBe(403);
    const other = await getQuote(
      await request('GET', `/api/quotes/${quote.id}`, { as: 'otherOwner' }),
      params(quote.id),
    );
    expect(other.status).toBe(404);
  });

  it('keeps every revision and refuses a stale save', async () => {
    const body = {
      revision: quote.revision,
      title: quote.title,
      lines: [
        ...quote.lines,
        {
          id: 'steps',
          kind: 'other',
          description: 'Two steps to the lawn',
          qty: 1,
          unit: 'item',
          unitCost: 15000,
        },
      ],
      marginPercent: 20,
      taxLabel: 'VAT',
      taxRatePercent: 20,
      depositPercent: 25,
      validUntil: new Date(Date.now() + 14 * 86400000).toISOString().slice(0, 10),
      terms: 'Balance on completion.',
    };
    const ok = await putQuote(
      await request('PUT', `/api/quotes/${quote.id}`, { as: 'designer', body }),
      params(quote.id),
    );
    expect(ok.status).toBe(200);
    const saved = await json<QuoteView>(ok);
    expect(saved.revision).toBe(quote.revision + 1);
    const stale = await putQuote(
      await request('PUT', `/api/quotes/${quote.id}`, { as: 'owner', body }),
      params(quote.id),
    );
    expect(stale.status).toBe(409);
    const revs = await json<{ revision: number }[]>(
      await revisions(
        await request('GET', `/api/quotes/${quote.id}/revisions`, { as: 'owner' }),
        params(quote.id),
      ),
    );
    expect(revs.map((r) => r.revision)).toEqual([2, 1]);
    quote = saved;
  });

  it('renders the quote PDF', async () => {
    const res = await quotePdf(
      await request('GET', `/api/quotes/${quote.id}/pdf`, { as: 'designer' }),
      params(quote.id),
    );
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(
      Buffer.from(await res.arrayBuffer())
        .subarray(0, 5)
        .toString(),
    ).toBe('%PDF-');
  });

  it('sending e-mails the client the link and the PDF, and marks the job quoted', async () => {
    const res = await send(
      await request('POST', `/api/quotes/${quote.id}/send`, { as: 'designer', body: {} }),
      params(quote.id),
    );
    expect(res.status).toBe(200);
    const out = await json<{ quote: QuoteView; link: string; emailStatus: string }>(res);
    expect(out.quote.status).toBe('sent');
    expect(out.emailStatus).toBe('sent');
    token = out.link.split('/p/')[1];
    const inbox = await (await fetch(`${env.sinkUrl}/messages?to=client.test@example.com`)).json();
    expect(inbox.items[0].subject).toContain(quote.reference);
    expect(inbox.items[0].text).toContain(`/p/${token}`);
    expect(inbox.items[0].attachments[0]).toMatchObject({ contentType: 'application/pdf' });
    const job = await json<{ status: string }>(
      await getJob(await request('GET', `/api/jobs/${jobId}`, { as: 'owner' }), params(jobId)),
    );
    expect(job.status).toBe('quoted');
  });
});

describe('the client proposal link', () => {
  it('shows the quote without the firm’s costs or margin', async () => {
    const res = await getProposal(
      await request('GET', `/api/proposals/${token}`),
      tokenParams(token),
    );
    expect(res.status).toBe(200);
    const text = await res.text();
    const view = JSON.parse(text);
    expect(view.reference).toBe(quote.reference);
    expect(view.cautions.join(' ')).toMatch(/qualified engineer/);
    expect(text).not.toContain('unitCost');
    expect(text).not.toContain('marginPercent');
    expect(view.totals.total).toBe(quote.totals.total);
  });

  it('a tampered link or another quote id is refused; an expired one says so', async () => {
    const [id, exp, sig] = token.split('.');
    const other = `${id.slice(0, -1)}${id.endsWith('0') ? '1' : '0'}.${exp}.${sig}`;
    expect(
      (await getProposal(await request('GET', `/api/proposals/x`), tokenParams(other))).status,
    ).toBe(404);
    const stretched = `${id}.${(parseInt(exp, 36) + 999999).toString(36)}.${sig}`;
    expect(
      (await getProposal(await request('GET', `/api/proposals/x`), tokenParams(stretched))).status,
    ).toBe(404);
    const expired = signToken('proposal', quote.id, new Date(Date.now() - 1000));
    expect(
      (await getProposal(await request('GET', `/api/proposals/x`), tokenParams(expired))).status,
    ).toBe(410);
    const answerTampered = await answer(
      await request('POST', `/api/proposals/x`, {
        body: { answer: 'accept', name: 'Pat Tester', agree: true },
      }),
      tokenParams(stretched),
    );
    expect(answerTampered.status).toBe(404);
  });

  it('acceptance needs a typed name, records it once, and moves the job to accepted', async () => {
    const noName = await answer(
      await request('POST', `/api/proposals/x`, { body: { answer: 'accept', agree: true } }),
      tokenParams(token),
    );
    expect(noName.status).toBe(400);
    const ok = await answer(
      await request('POST', `/api/proposals/x`, {
        body: { answer: 'accept', name: 'Pat Tester', agree: true },
      }),
      tokenParams(token),
    );
    expect(ok.status).toBe(200);
    const view = await json<{ status: string; acceptedName: string; acceptedAt: string }>(ok);
    expect(view).toMatchObject({ status: 'accepted', acceptedName: 'Pat Tester' });
    expect(Date.parse(view.acceptedAt)).toBeGreaterThan(Date.now() - 60_000);
    const again = await answer(
      await request('POST', `/api/proposals/x`, { body: { answer: 'decline' } }),
      tokenParams(token),
    );
    expect(again.status).toBe(409);
    const job = await json<{ status: string }>(
      await getJob(await request('GET', `/api/jobs/${jobId}`, { as: 'owner' }), params(jobId)),
    );
    expect(job.status).toBe('accepted');
    const locked = await putQuote(
      await request('PUT', `/api/quotes/${quote.id}`, {
        as: 'designer',
        body: { ...quote, revision: quote.revision, lines: quote.lines },
      }),
      params(quote.id),
    );
    expect(locked.status).toBe(409);
  });
});

describe('deposit payment', () => {
  it('a webhook without a valid signature is refused and records nothing', async () => {
    const res = await stripeWebhook(
      new Request('http://localhost/api/webhooks/stripe', {
        method: 'POST',
        headers: { 'stripe-signature': 't=1,v1=deadbeef' },
        body: JSON.stringify({ id: 'evt_forged', type: 'checkout.session.completed' }),
      }),
    );
    expect(res.status).toBe(400);
    expect(await bdb().models.WebhookEvent.count({ where: { eventId: 'evt_forged' } })).toBe(0);
  });

  it('pays through the payment service; a second delivery of the event changes nothing', async () => {
    const res = await deposit(
      new Request(`http://localhost/api/proposals/${token}/deposit`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
      }),
      tokenParams(token),
    );
    expect(res.status).toBe(200);
    const { url } = await json<{ url: string }>(res);
    const sessionId = url.split('/pay/')[1];
    const { models } = bdb();
    const pending = await models.Payment.findOne({ where: { checkoutSessionId: sessionId } });
    expect(pending).toMatchObject({ status: 'pending', amount: quote.totals.deposit });

    const paid = await (
      await fetch(`${env.stripeBase}/_fake/sessions/${sessionId}/pay`, { method: 'POST' })
    ).json();
    expect(paid.status).toBe(200);
    const again = await (
      await fetch(`${env.stripeBase}/_fake/sessions/${sessionId}/deliver`, { method: 'POST' })
    ).json();
    expect(again.status).toBe(200);
    expect(JSON.parse(again.body)).toMatchObject({ status: 'duplicate' });
    expect(env.webhookHits()).toBe(2);

    const rows = await models.Payment.findAll({ where: { quoteId: quote.id } });
    expect(rows.filter((p) => p.status === 'paid')).toHaveLength(1);
    expect(rows[0].paidAt).toBeInstanceOf(Date);
    const events = await models.WebhookEvent.findAll({
      where: { provider: 'stripe', eventId: rows[0].providerEventId! },
    });
    expect(events).toHaveLength(1);
    expect(events[0].deliveries).toBe(2);

    const view = await json<{ depositPaid: boolean }>(
      await getProposal(await request('GET', `/api/proposals/x`), tokenParams(token)),
    );
    expect(view.depositPaid).toBe(true);
    const second = await deposit(
      new Request(`http://localhost/api/proposals/${token}/deposit`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
      }),
      tokenParams(token),
    );
    expect(second.status).toBe(409);
  });
});
