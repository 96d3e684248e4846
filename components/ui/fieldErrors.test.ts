import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { apiFieldsToFieldErrors, issuesToFieldErrors } from './fieldErrors';

describe('issuesToFieldErrors', () => {
  it('keys nested fields by dotted path and keeps the first message', () => {
    const schema = z.object({
      title: z.string().min(1, 'Title is required').max(3, 'Too long'),
      client: z.object({ email: z.email('Enter a valid email address') }),
    });
    const res = schema.safeParse({ title: '', client: { email: 'nope' } });
    expect(res.success).toBe(false);
    if (res.success) return;
    expect(issuesToFieldErrors(res.error.issues)).toEqual({
      title: 'Title is required',
      'client.email': 'Enter a valid email address',
    });
  });

  it('puts form-wide issues under the empty key', () => {
    expect(issuesToFieldErrors([{ path: [], message: 'Nothing to change' }])).toEqual({
      '': 'Nothing to change',
    });
  });
});

describe('apiFieldsToFieldErrors', () => {
  it('takes the first message of each field', () => {
    expect(apiFieldsToFieldErrors({ title: ['Title is required', 'x'], notes: [] })).toEqual({
      title: 'Title is required',
    });
  });
});
