import { describe, expect, it } from 'vitest';
import { hashToken, randomToken, signToken, verifyToken } from './signedToken';

const key = 'test-key-for-signing';
const id = '6f1d2c3b-1a2b-4c5d-8e9f-0a1b2c3d4e5f';
const now = new Date('2026-12-01T12:00:00Z');
const later = new Date('2026-12-31T12:00:00Z');

describe('signed client links', () => {
  it('round-trips the subject until it expires', () => {
    const t = signToken('proposal', id, later, key);
    expect(verifyToken('proposal', t, now, key)).toMatchObject({ ok: true, subject: id });
    expect(verifyToken('proposal', t, new Date('2027-01-01T00:00:00Z'), key)).toEqual({
      ok: false,
      reason: 'expired',
    });
  });

  it('refuses a changed subject, a stretched expiry, another purpose or another key', () => {
    const t = signToken('proposal', id, later, key);
    const [s, e, sig] = t.split('.');
    const otherId = s.replace(/^6/, '7');
    expect(verifyToken('proposal', `${otherId}.${e}.${sig}`, now, key)).toMatchObject({
      reason: 'tampered',
    });
    const longer = (parseInt(e, 36) + 86400 * 365).toString(36);
    expect(verifyToken('proposal', `${s}.${longer}.${sig}`, now, key)).toMatchObject({
      reason: 'tampered',
    });
    expect(verifyToken('invite', t, now, key)).toMatchObject({ reason: 'tampered' });
    expect(verifyToken('proposal', t, now, 'another-key')).toMatchObject({ reason: 'tampered' });
    expect(verifyToken('proposal', `${t}x`, now, key)).toMatchObject({ reason: 'malformed' });
    expect(verifyToken('proposal', '../../etc/passwd', now, key)).toMatchObject({
      reason: 'malformed',
    });
  });

  it('keeps only a hash of single-use tokens', () => {
    const a = randomToken();
    expect(a.hash).toBe(hashToken(a.token));
    expect(a.hash).not.toContain(a.token);
    expect(randomToken().token).not.toBe(a.token);
  });
});
