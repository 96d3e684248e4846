// The local fakes answer the real SDKs (nodemailer, stripe, @aws-sdk/client-s3) the way the app
// uses them, so the app code is the same against the fakes and the real services.
import fs from 'node:fs';
import path from 'node:path';
import http from 'node:http';
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import nodemailer from 'nodemailer';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// @ts-expect-error plain ESM script without types
import { startFakes } from '../../scripts/fakes/index.mjs';

type Fakes = {
  ports: { smtp: number; mailApi: number; stripe: number; s3: number };
  env: Record<string, string>;
  close: () => Promise<void>;
};

const dataDir = path.join(process.cwd(), '.tmp', `fakes-test-${process.pid}`);
let fakes: Fakes;

beforeAll(async () => {
  fakes = await startFakes({ ports: { smtp: 0, mailApi: 0, stripe: 0, s3: 0 }, dataDir });
});
afterAll(async () => {
  await fakes?.close();
  fs.rmSync(dataDir, { recursive: true, force: true });
});

describe('SMTP sink', () => {
  it('stores what nodemailer sends, with attachments, and serves it over HTTP', async () => {
    const t = nodemailer.createTransport(fakes.env.SMTP_URL);
    await t.sendMail({
      from: 'Larchfield Decks <office@larchfield.example>',
      to: 'supplier@example.com',
      subject: 'Materials order — 4 Mill Lane',
      text: 'Please find the order attached. £120.50',
      attachments: [{ filename: 'order.csv', content: 'item,qty\njoist 3.0 m,24\n' }],
    });
    const list = await (
      await fetch(`${fakes.env.MAIL_SINK_URL}/messages?to=supplier@example.com`)
    ).json();
    expect(list.items).toHaveLength(1);
    const msg = await (
      await fetch(`${fakes.env.MAIL_SINK_URL}/messages/${list.items[0].id}`)
    ).json();
    expect(msg.subject).toBe('Materials order — 4 Mill Lane');
    expect(msg.text).toContain('£120.50');
    expect(msg.attachments).toEqual([
      expect.objectContaining({ filename: 'order.csv', contentType: 'text/csv' }),
    ]);
    const csv = await (
      await fetch(`${fakes.env.MAIL_SINK_URL}/messages/${msg.id}/attachments/0`)
    ).text();
    expect(csv).toBe('item,qty\njoist 3.0 m,24\n');
  });

  it('refuses the next message when told to, so retries can be tested', async () => {
    await fetch(`${fakes.env.MAIL_SINK_URL}/control`, {
      method: 'POST',
      body: JSON.stringify({ rejectNext: 1 }),
    });
    const t = nodemailer.createTransport(fakes.env.SMTP_URL);
    const mail = { from: 'a@example.com', to: 'b@example.com', subject: 's', text: 't' };
    await expect(t.sendMail(mail)).rejects.toThrow(/451|refuse/);
    await expect(t.sendMail(mail)).resolves.toBeTruthy();
  });
});

describe('Stripe fake', () => {
  it('creates and reads a checkout session, and delivers a webhook the SDK verifies', async () => {
    const received: { body: string; sig: string }[] = [];
    const hook = http.createServer((req, res) => {
      let body = '';
      req.on('data', (c) => (body += c));
      req.on('end', () => {
        received.push({ body, sig: String(req.headers['stripe-signature']) });
        res.end('{}');
      });
    });
    await new Promise<void>((r) => hook.listen(0, '127.0.0.1', () => r()));
    const hookPort = (hook.address() as { port: number }).port;
    try {
      const base = new URL(fakes.env.STRIPE_API_BASE);
      const stripe = new Stripe(fakes.env.STRIPE_SECRET_KEY, {
        host: base.hostname,
        port: base.port,
        protocol: 'http',
        maxNetworkRetries: 0,
      });
      const session = await stripe.checkout.sessions.create({
        mode: 'payment',
        success_url: `http://127.0.0.1:${hookPort}/done?s={CHECKOUT_SESSION_ID}`,
        cancel_url: `http://127.0.0.1:${hookPort}/cancel`,
        client_reference_id: 'quote-1',
        metadata: { quoteId: 'quote-1' },
        line_items: [
          {
            quantity: 1,
            price_data: { currency: 'gbp', unit_amount: 123456, product_data: { name: 'Deposit' } },
          },
        ],
      });
      expect(session.amount_total).toBe(123456);
      expect(session.url).toMatch(/\/pay\/cs_test_/);
      expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('unpaid');

      const payRes = await fetch(`${fakes.env.STRIPE_API_BASE}/_fake/sessions/${session.id}/pay`, {
        method: 'POST',
      });
      expect(payRes.status).toBe(200);
      expect(received).toHaveLength(1);
      const event = stripe.webhooks.constructEvent(
        received[0].body,
        received[0].sig,
        fakes.env.STRIPE_WEBHOOK_SECRET,
      );
      expect(event.type).toBe('checkout.session.completed');
      expect(() =>
        stripe.webhooks.constructEvent(
          received[0].body.replace('123456', '1'),
          received[0].sig,
          fakes.env.STRIPE_WEBHOOK_SECRET,
        ),
      ).toThrow();
      expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('paid');

      // A second delivery carries the same event id (what the app must treat as a duplicate).
      await fetch(`${fakes.env.STRIPE_API_BASE}/_fake/sessions/${session.id}/deliver`, {
        method: 'POST',
      });
      expect(received).toHaveLength(2);
      expect(JSON.parse(received[1].body).id).toBe(event.id);
    } finally {
      hook.close();
    }
  });
});

describe('S3 fake', () => {
  it('puts, heads, gets, lists and deletes objects through the AWS SDK', async () => {
    const s3 = new S3Client({
      endpoint: fakes.env.S3_ENDPOINT,
      region: 'us-east-1',
      forcePathStyle: true,
      credentials: { accessKeyId: 'x', secretAccessKey: 'y' },
    });
    const Bucket = 'test-bucket';
    await s3.send(new CreateBucketCommand({ Bucket }));
    const body = Buffer.from([0x89, 0x50, 0x4e, 0x47, 1, 2, 3]);
    await s3.send(
      new PutObjectCommand({
        Bucket,
        Key: 'firm/a b/photo.png',
        Body: body,
        ContentType: 'image/png',
      }),
    );
    const head = await s3.send(new HeadObjectCommand({ Bucket, Key: 'firm/a b/photo.png' }));
    expect(head.ContentLength).toBe(body.length);
    expect(head.ContentType).toBe('image/png');
    const got = await s3.send(new GetObjectCommand({ Bucket, Key: 'firm/a b/photo.png' }));
    expect(Buffer.from(await got.Body!.transformToByteArray())).toEqual(body);
    const list = await s3.send(new ListObjectsV2Command({ Bucket, Prefix: 'firm/' }));
    expect(list.Contents?.map((c) => c.Key)).toEqual(['firm/a b/photo.png']);
    await s3.send(new DeleteObjectCommand({ Bucket, Key: 'firm/a b/photo.png' }));
    await expect(
      s3.send(new GetObjectCommand({ Bucket, Key: 'firm/a b/photo.png' })),
    ).rejects.toMatchObject({ name: 'NoSuchKey' });
  });
});
