import { UniqueConstraintError, ValidationError } from 'sequelize';
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import {
  BadRequest,
  Conflict,
  Forbidden,
  handle,
  MAX_BODY_BYTES,
  NotFound,
  parseInput,
  readJson,
  toResponse,
  Unauthorized,
} from './errors';

describe('toResponse', () => {
  it.each([
    [
      new BadRequest('Bad', { title: ['Title is required'] }),
      400,
      { error: 'Bad', fields: { title: ['Title is required'] } },
    ],
    [new Unauthorized(), 401, { error: 'Sign in to continue' }],
    [new Forbidden('No'), 403, { error: 'No' }],
    [new NotFound('Job not found'), 404, { error: 'Job not found' }],
    [
      new Conflict('Stale', { current: { version: 2 } }),
      409,
      { error: 'Stale', current: { version: 2 } },
    ],
    [new UniqueConstraintError({}), 409, { error: 'That already exists' }],
  ])('maps %s', async (err, status, body) => {
    const res = toResponse(err);
    expect(res.status).toBe(status);
    expect(await res.json()).toEqual(body);
  });

  it('hides the details of unexpected errors', async () => {
    const spy = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    for (const err of [new Error('password=hunter2'), new ValidationError('select secret', [])]) {
      const res = toResponse(err);
      expect(res.status).toBe(500);
      expect(JSON.stringify(await res.json())).not.toMatch(/hunter2|secret/);
    }
    spy.mockRestore();
  });
});

describe('parseInput', () => {
  const schema = z.object({
    a: z.object({ b: z.number('b must be a number') }),
    c: z.string('c is text'),
  });
  it('returns the parsed value', () => {
    expect(parseInput(schema, { a: { b: 1 }, c: 'x' })).toEqual({ a: { b: 1 }, c: 'x' });
  });
  it('throws a 400 with every message keyed by dotted path, the first one leading', async () => {
    const err = catchIt(() => parseInput(schema, { a: { b: 'x' } }));
    expect(err).toBeInstanceOf(BadRequest);
    const res = toResponse(err);
    expect(res.status).toBe(400);
    expect(await res.json()).toEqual({
      error: 'b must be a number',
      fields: { 'a.b': ['b must be a number'], c: ['c is text'] },
    });
  });
});

function catchIt(fn: () => unknown): unknown {
  try {
    fn();
  } catch (err) {
    return err;
  }
  throw new Error('did not throw');
}

describe('readJson and handle', () => {
  const post = (body: string) => new Request('http://x/', { method: 'POST', body });
  it('reads JSON and treats an empty body as {}', async () => {
    expect(await readJson(post('{"a":1}'))).toEqual({ a: 1 });
    expect(await readJson(post(''))).toEqual({});
  });
  it('answers 400 for broken JSON and 413 for a huge body', async () => {
    const route = handle(async (req: Request) => Response.json(await readJson(req)));
    expect((await route(post('{"a":'))).status).toBe(400);
    expect((await route(post(`"${'x'.repeat(MAX_BODY_BYTES)}"`))).status).toBe(413);
    expect((await route(post('[1]'))).status).toBe(200);
  });
});
