// Starts every local fake of a hosted service on loopback: `node scripts/fakes/index.mjs`.
// Ports come from FAKES_PORT_BASE (default 4710: SMTP, mail API, Stripe, S3 on base..base+3), or
// one by one from FAKE_SMTP_PORT / FAKE_MAIL_API_PORT / FAKE_STRIPE_PORT / FAKE_S3_PORT. Data lives
// in FAKES_DATA_DIR (default .data/fakes). Importable: startFakes() is what the tests call.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  DEFAULT_FAKES_PORT_BASE,
  FAKE_STRIPE_WEBHOOK_SECRET,
  fakePorts,
  fakeServiceEnv,
} from './config.mjs';
import { startS3Fake } from './s3.mjs';
import { startSmtpSink } from './smtp.mjs';
import { startStripeFake } from './stripe.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/**
 * Starts the SMTP sink, the Stripe fake and the S3 fake. Ports of 0 pick free ones. Returns the
 * bound ports, the environment that points the app at them, and close().
 */
export async function startFakes({
  ports = fakePorts(DEFAULT_FAKES_PORT_BASE),
  dataDir = path.join(root, '.data', 'fakes'),
  host = '127.0.0.1',
  webhookSecret = FAKE_STRIPE_WEBHOOK_SECRET,
  stripeWebhookUrl,
} = {}) {
  const mail = await startSmtpSink({
    host,
    smtpPort: ports.smtp,
    apiPort: ports.mailApi,
    dir: path.join(dataDir, 'mail'),
  });
  const stripe = await startStripeFake({
    host,
    port: ports.stripe,
    dir: path.join(dataDir, 'stripe'),
    webhookSecret,
    webhookUrl: stripeWebhookUrl,
  });
  const s3 = await startS3Fake({ host, port: ports.s3, dir: path.join(dataDir, 's3') });
  const bound = { smtp: mail.smtpPort, mailApi: mail.apiPort, stripe: stripe.port, s3: s3.port };
  return {
    ports: bound,
    env: { ...fakeServiceEnv(bound), STRIPE_WEBHOOK_SECRET: webhookSecret },
    mail,
    stripe,
    s3,
    close: () => Promise.all([mail.close(), stripe.close(), s3.close()]),
  };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const base = fakePorts(process.env.FAKES_PORT_BASE || DEFAULT_FAKES_PORT_BASE);
  const ports = {
    smtp: Number(process.env.FAKE_SMTP_PORT || base.smtp),
    mailApi: Number(process.env.FAKE_MAIL_API_PORT || base.mailApi),
    stripe: Number(process.env.FAKE_STRIPE_PORT || base.stripe),
    s3: Number(process.env.FAKE_S3_PORT || base.s3),
  };
  const dataDir = path.resolve(root, process.env.FAKES_DATA_DIR || '.data/fakes');
  // FAKES_FRESH=1 (end-to-end runs) starts from empty mail, payments and storage.
  if (process.env.FAKES_FRESH === '1') fs.rmSync(dataDir, { recursive: true, force: true });
  const fakes = await startFakes({
    ports,
    dataDir,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET || FAKE_STRIPE_WEBHOOK_SECRET,
    stripeWebhookUrl: process.env.FAKE_STRIPE_WEBHOOK_URL || undefined,
  });
  const p = fakes.ports;
  process.stderr.write(
    `[fakes] smtp 127.0.0.1:${p.smtp} · mail API http://127.0.0.1:${p.mailApi} · stripe http://127.0.0.1:${p.stripe} · s3 http://127.0.0.1:${p.s3}\n`,
  );
  const stop = () => fakes.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
