// Typed errors for services and the ONE place that turns any error into an HTTP answer.
import { BaseError, ForeignKeyConstraintError, UniqueConstraintError } from 'sequelize';
import { z } from 'zod';

export type FieldErrors = Record<string, string[]>;

export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    /** Extra keys merged into the JSON body (e.g. `fields`, `current`). */
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class BadRequest extends HttpError {
  constructor(message: string, fields?: FieldErrors) {
    super(400, message, fields ? { fields } : {});
  }
}
export class Unauthorized extends HttpError {
  constructor(message = 'Sign in to continue') {
    super(401, message);
  }
}
export class Forbidden extends HttpError {
  constructor(message = 'Your role does not allow this') {
    super(403, message);
  }
}
export class NotFound extends HttpError {
  constructor(message = 'Not found') {
    super(404, message);
  }
}
export class Conflict extends HttpError {
  constructor(message: string, extra: Record<string, unknown> = {}) {
    super(409, message, extra);
  }
}

/** Field messages keyed by dotted path ('' becomes '_form'), in the order zod reported them. */
export function zodFields(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_form';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

/** Parses input with a shared schema; failures become a 400 with per-field messages. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fields = zodFields(result.error);
  // The first message leads; `fields` carries every message for the form to place.
  throw new BadRequest(result.error.issues[0]?.message ?? 'Invalid input', fields);
}

/** Maps any thrown value to `{ error, fields? }` JSON with the right status code. */
export function toResponse(err: unknown): Response {
  if (err instanceof HttpError) {
    return Response.json({ error: err.message, ...err.extra }, { status: err.status });
  }
  if (err instanceof z.ZodError) {
    return Response.json(
      { error: 'Some fields need attention', fields: zodFields(err) },
      { status: 400 },
    );
  }
  if (err instanceof UniqueConstraintError) {
    return Response.json({ error: 'That already exists' }, { status: 409 });
  }
  if (err instanceof ForeignKeyConstraintError) {
    return Response.json({ error: 'A linked record does not exist' }, { status: 400 });
  }
  if (err instanceof BaseError) {
    console.error('[api] database error:', err);
    return Response.json({ error: 'Something went wrong on the server' }, { status: 500 });
  }
  console.error('[api] unexpected error:', err);
  return Response.json({ error: 'Something went wrong on the server' }, { status: 500 });
}

/** Wraps a route handler so every error is answered by toResponse. */
export function handle<Args extends unknown[]>(
  fn: (req: Request, ...args: Args) => Promise<Response>,
): (req: Request, ...args: Args) => Promise<Response> {
  return async (req, ...args) => {
    try {
      return await fn(req, ...args);
    } catch (err) {
      return toResponse(err);
    }
  };
}

/** Largest JSON body accepted (a 200-corner design document is far below this). */
export const MAX_BODY_BYTES = 1_000_000;

/** Reads a JSON body; anything that is not JSON is a 400, anything huge a 413. */
export async function readJson(req: Request): Promise<unknown> {
  const declared = Number(req.headers.get('content-length') ?? 0);
  if (declared > MAX_BODY_BYTES) throw new HttpError(413, 'The request body is too large');
  const text = await req.text();
  if (text.length > MAX_BODY_BYTES) throw new HttpError(413, 'The request body is too large');
  if (!text.trim()) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new BadRequest('The request body must be JSON');
  }
}
