// Signed, expiring links for people without an account (the client's proposal): HMAC-SHA256 over
// purpose, subject id and expiry, compared in constant time. Nothing secret is inside the token.
import crypto from 'node:crypto';

export type TokenCheck =
  | { ok: true; subject: string; expiresAt: Date }
  | { ok: false; reason: 'malformed' | 'tampered' | 'expired' };

function secret(): string {
  const s = process.env.PROPOSAL_SECRET || process.env.NEXTAUTH_SECRET;
  if (!s) throw new Error('PROPOSAL_SECRET or NEXTAUTH_SECRET must be set to sign client links');
  return s;
}

function mac(purpose: string, subject: string, exp: number, key: string): Buffer {
  return crypto.createHmac('sha256', key).update(`${purpose}\n${subject}\n${exp}`).digest();
}

/** A token `<subject>.<expiry seconds>.<signature>` for `purpose`, valid until `expiresAt`. */
export function signToken(
  purpose: string,
  subject: string,
  expiresAt: Date,
  key = secret(),
): string {
  if (!/^[A-Za-z0-9-]+$/.test(subject)) throw new Error('subject must be an id');
  const exp = Math.floor(expiresAt.getTime() / 1000);
  return `${subject}.${exp.toString(36)}.${mac(purpose, subject, exp, key).toString('base64url')}`;
}

/** Checks a token's signature first, then its expiry against `now`. */
export function verifyToken(
  purpose: string,
  token: string,
  now = new Date(),
  key = secret(),
): TokenCheck {
  const m = /^([A-Za-z0-9-]{1,64})\.([0-9a-z]{1,12})\.([A-Za-z0-9_-]{43})$/.exec(token);
  if (!m) return { ok: false, reason: 'malformed' };
  const [, subject, expText, sigText] = m;
  const exp = parseInt(expText, 36);
  const given = Buffer.from(sigText, 'base64url');
  const expected = mac(purpose, subject, exp, key);
  if (given.length !== expected.length || !crypto.timingSafeEqual(given, expected))
    return { ok: false, reason: 'tampered' };
  if (exp * 1000 <= now.getTime()) return { ok: false, reason: 'expired' };
  return { ok: true, subject, expiresAt: new Date(exp * 1000) };
}

/** A random single-use token and the SHA-256 hash the database keeps instead of it. */
export function randomToken(): { token: string; hash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex');
}
