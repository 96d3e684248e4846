// Where the hosted services are: each setting defaults to the local fake that
// `node scripts/fakes/index.mjs` starts (port base 4710); set it to switch to the real service.
const FAKE_BASE = 4710;
const loop = (offset: number, scheme = 'http') => `${scheme}://127.0.0.1:${FAKE_BASE + offset}`;

export interface ServiceConfig {
  smtpUrl: string;
  mailFrom: string;
  /** HTTP API of the local SMTP sink, for the dev inbox; empty when mail goes to a real server. */
  mailSinkUrl: string;
  stripeApiBase: string;
  stripeSecretKey: string;
  stripeWebhookSecret: string;
  s3Endpoint: string | undefined;
  s3Bucket: string;
  s3Region: string;
  s3AccessKeyId: string;
  s3SecretAccessKey: string;
  s3ForcePathStyle: boolean;
  /** The app's own public origin, for links in e-mails and payment return addresses. */
  appUrl: string;
}

/** Reads the settings from the environment on every call (tests change them between runs). */
export function serviceConfig(env: NodeJS.ProcessEnv = process.env): ServiceConfig {
  const s3Endpoint = env.S3_ENDPOINT === 'aws' ? undefined : env.S3_ENDPOINT || loop(3);
  return {
    smtpUrl: env.SMTP_URL || loop(0, 'smtp'),
    mailFrom: env.MAIL_FROM || 'Joistwright <no-reply@joistwright.local>',
    mailSinkUrl: env.MAIL_SINK_URL ?? (env.SMTP_URL ? '' : loop(1)),
    stripeApiBase: env.STRIPE_API_BASE || loop(2),
    stripeSecretKey: env.STRIPE_SECRET_KEY || 'sk_test_joistwright_local_fake',
    stripeWebhookSecret: env.STRIPE_WEBHOOK_SECRET || 'whsec_joistwright_local_fake',
    s3Endpoint,
    s3Bucket: env.S3_BUCKET || 'joistwright-local',
    s3Region: env.S3_REGION || 'us-east-1',
    s3AccessKeyId: env.S3_ACCESS_KEY_ID || 'local-fake',
    s3SecretAccessKey: env.S3_SECRET_ACCESS_KEY || 'local-fake-secret',
    s3ForcePathStyle: env.S3_FORCE_PATH_STYLE ? env.S3_FORCE_PATH_STYLE === '1' : !!s3Endpoint,
    appUrl: (env.APP_URL || env.NEXTAUTH_URL || 'http://localhost:3000').replace(/\/$/, ''),
  };
}
