// Shared set-up for the business integration tests: the local fakes on random loopback ports, an
// HTTP bridge so the Stripe fake's webhooks reach the route handler, and a fresh job with a design.
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { POST as postDesign } from '@/app/api/jobs/[id]/designs/route';
import { POST as postJob } from '@/app/api/jobs/route';
import { POST as stripeWebhook } from '@/app/api/webhooks/stripe/route';
// @ts-expect-error plain ESM script without types
import { startFakes } from '../../scripts/fakes/index.mjs';
import { json, params, request, type Who } from './helpers';

export interface Fakes {
  ports: { smtp: number; mailApi: number; stripe: number; s3: number };
  env: Record<string, string>;
  close: () => Promise<void>;
}

/** Starts the fakes and a webhook bridge, and points the app's settings at them. */
export async function startBusinessFakes(): Promise<{
  fakes: Fakes;
  stripeBase: string;
  sinkUrl: string;
  webhookHits: () => number;
  stop: () => Promise<void>;
}> {
  let hits = 0;
  const bridge = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', async () => {
      hits += 1;
      const r = await stripeWebhook(
        new Request(`http://127.0.0.1${req.url}`, {
          method: 'POST',
          headers: req.headers as Record<string, string>,
          body: Buffer.concat(chunks).toString('utf8'),
        }),
      );
      res.writeHead(r.status, { 'content-type': 'application/json' });
      res.end(await r.text());
    });
  });
  await new Promise<void>((r) => bridge.listen(0, '127.0.0.1', () => r()));
  const bridgePort = (bridge.address() as { port: number }).port;
  const dataDir = path.join(process.cwd(), '.tmp', `business-it-${process.pid}-${Date.now()}`);
  const fakes: Fakes = await startFakes({
    ports: { smtp: 0, mailApi: 0, stripe: 0, s3: 0 },
    dataDir,
    stripeWebhookUrl: `http://127.0.0.1:${bridgePort}/api/webhooks/stripe`,
  });
  const settings = { ...fakes.env, MAIL_RETRY_BASE_MS: '0' };
  const before = Object.fromEntries(Object.keys(settings).map((k) => [k, process.env[k]]));
  Object.assign(process.env, settings);
  return {
    fakes,
    stripeBase: fakes.env.STRIPE_API_BASE,
    sinkUrl: fakes.env.MAIL_SINK_URL,
    webhookHits: () => hits,
    stop: async () => {
      // Later test files in this worker must not inherit settings pointing at closed ports.
      for (const [k, v] of Object.entries(before)) {
        if (v === undefined) delete process.env[k];
        else process.env[k] = v;
      }
      await fakes.close();
      await new Promise((r) => bridge.close(r));
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** A new job (with a client who has an e-mail address) and its starter design, made through the API. */
export async function freshJob(as: Who = 'designer', clientEmail = 'client.test@example.com') {
  const jobRes = await postJob(
    await request('POST', '/api/jobs', {
      as,
      body: {
        title: `Business test ${Date.now()}`,
        siteAddress: '12 Test Row, Kestrelford',
        client: { name: 'Pat Tester', email: clientEmail },
      },
    }),
  );
  if (jobRes.status !== 201) throw new Error(`job: ${jobRes.status} ${await jobRes.text()}`);
  const job = await json<{ id: string }>(jobRes);
  const dRes = await postDesign(
    await request('POST', `/api/jobs/${job.id}/designs`, { as, body: { name: 'Back garden' } }),
    params(job.id),
  );
  if (dRes.status !== 201) throw new Error(`design: ${dRes.status} ${await dRes.text()}`);
  const design = await json<{ id: string }>(dRes);
  return { jobId: job.id, designId: design.id };
}
