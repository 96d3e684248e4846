import { describe, expect, it } from 'vitest';
import { clientCreateSchema } from './client';
import { meUpdateSchema } from './me';
import { signInSchema } from './auth';

describe('clientCreateSchema', () => {
  it('lower-cases the email and nulls empty optional fields', () => {
    expect(
      clientCreateSchema.parse({
        name: ' Ann Lee ',
        email: ' Ann@Example.COM ',
        phone: '',
        address: undefined,
      }),
    ).toEqual({ name: 'Ann Lee', email: 'ann@example.com', phone: null, address: null });
  });
  it.each([
    [{}, 'name'],
    [{ name: '' }, 'name'],
    [{ name: 'A', email: 'not-an-email' }, 'email'],
    [{ name: 'A', phone: 'x'.repeat(51) }, 'phone'],
  ])('refuses %o', (input, field) => {
    const r = clientCreateSchema.safeParse(input);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path[0]).toBe(field);
  });
});

describe('meUpdateSchema', () => {
  it('accepts metric and imperial only', () => {
    expect(meUpdateSchema.parse({ units: 'imperial' })).toEqual({ units: 'imperial' });
    expect(meUpdateSchema.safeParse({ units: 'cubits' }).success).toBe(false);
  });
});

describe('signInSchema', () => {
  it('normalises the email', () => {
    expect(signInSchema.parse({ email: ' Owner@Larchfield.EXAMPLE ', password: 'p' }).email).toBe(
      'owner@larchfield.example',
    );
  });
  it('needs both fields', () => {
    expect(signInSchema.safeParse({ email: 'a@b.example', password: '' }).success).toBe(false);
    expect(signInSchema.safeParse({ email: '', password: 'p' }).success).toBe(false);
  });
});
