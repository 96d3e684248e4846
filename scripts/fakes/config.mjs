// Where the local fakes of the hosted services listen, and the settings that point the app at them.
// One port base gives four loopback ports: SMTP, the mail sink's HTTP API, Stripe and S3.

/** The port base `npm start` uses when FAKES_PORT_BASE is not set. */
export const DEFAULT_FAKES_PORT_BASE = 4710;

/** A port base per end-to-end port, so several Playwright runs on one machine do not collide. */
export function e2eFakesPortBase(e2ePort) {
  return 20000 + (Number(e2ePort) % 1000) * 10;
}

/** The four ports of a base. */
export function fakePorts(base = DEFAULT_FAKES_PORT_BASE) {
  const b = Number(base);
  return { smtp: b, mailApi: b + 1, stripe: b + 2, s3: b + 3 };
}

/** Signing secret the Stripe fake signs webhooks with and the app verifies them with. */
export const FAKE_STRIPE_WEBHOOK_SECRET = 'whsec_joistwright_local_fake';
/** Any key starting sk_test_ is accepted by the fake. */
export const FAKE_STRIPE_SECRET_KEY = 'sk_test_joistwright_local_fake';

/**
 * The environment that points the app at fakes listening on `ports`. Real services are used by
 * setting these variables to the real values instead.
 */
export function fakeServiceEnv(ports) {
  return {
    SMTP_URL: `smtp://127.0.0.1:${ports.smtp}`,
    MAIL_SINK_URL: `http://127.0.0.1:${ports.mailApi}`,
    STRIPE_API_BASE: `http://127.0.0.1:${ports.stripe}`,
    STRIPE_SECRET_KEY: FAKE_STRIPE_SECRET_KEY,
    STRIPE_WEBHOOK_SECRET: FAKE_STRIPE_WEBHOOK_SECRET,
    S3_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
    S3_BUCKET: 'joistwright-local',
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'local-fake',
    S3_SECRET_ACCESS_KEY: 'local-fake-secret',
  };
}
