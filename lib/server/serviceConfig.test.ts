import { describe, expect, it } from 'vitest';
// @ts-expect-error plain ESM script without types
import * as fakes from '../../scripts/fakes/config.mjs';
import { serviceConfig } from './serviceConfig';

describe('service settings', () => {
  it('default to exactly where the local fakes listen by default', () => {
    const env = fakes.fakeServiceEnv(fakes.fakePorts(fakes.DEFAULT_FAKES_PORT_BASE));
    const c = serviceConfig({} as NodeJS.ProcessEnv);
    expect(c.smtpUrl).toBe(env.SMTP_URL);
    expect(c.mailSinkUrl).toBe(env.MAIL_SINK_URL);
    expect(c.stripeApiBase).toBe(env.STRIPE_API_BASE);
    expect(c.stripeSecretKey).toBe(env.STRIPE_SECRET_KEY);
    expect(c.stripeWebhookSecret).toBe(env.STRIPE_WEBHOOK_SECRET);
    expect(c.s3Endpoint).toBe(env.S3_ENDPOINT);
    expect(c.s3Bucket).toBe(env.S3_BUCKET);
    expect(c.s3ForcePathStyle).toBe(true);
  });

  it('switch to real services by setting them', () => {
    const c = serviceConfig({
      SMTP_URL: 'smtps://u:p@smtp.example.com',
      STRIPE_API_BASE: 'https://api.stripe.com',
      S3_ENDPOINT: 'aws',
    } as unknown as NodeJS.ProcessEnv);
    expect(c.mailSinkUrl).toBe('');
    expect(c.s3Endpoint).toBeUndefined();
    expect(c.s3ForcePathStyle).toBe(false);
  });
});
