// Browser-side JSON calls to our API, turning the error shape `{ error, fields? }` into an ApiError.
export class ApiError extends Error {
  readonly status: number;
  readonly fields: Record<string, string[]>;
  readonly body: unknown;

  constructor(
    status: number,
    message: string,
    fields: Record<string, string[]> = {},
    body?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.fields = fields;
    this.body = body;
  }
}

const fallbackMessages: Record<number, string> = {
  400: 'Some of the details need another look.',
  401: 'Your session has ended. Please sign in again.',
  403: 'Your role does not allow this.',
  404: 'Not found. It may have been deleted.',
  409: 'Someone else changed this in the meantime.',
};

/** Fetches JSON; `json` is sent as the request body. Throws ApiError on any non-2xx answer. */
export async function fetchJson<T>(
  url: string,
  init: Omit<RequestInit, 'body'> & { json?: unknown } = {},
): Promise<T> {
  const { json, headers, ...rest } = init;
  const res = await fetch(url, {
    ...rest,
    headers: {
      Accept: 'application/json',
      ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}),
      ...headers,
    },
    body: json !== undefined ? JSON.stringify(json) : undefined,
  });
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  let body: unknown = undefined;
  if (text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = text;
    }
  }
  if (!res.ok) {
    const b = (body && typeof body === 'object' ? body : {}) as {
      error?: unknown;
      fields?: unknown;
    };
    const message =
      typeof b.error === 'string' && b.error
        ? b.error
        : (fallbackMessages[res.status] ?? `The server answered ${res.status}.`);
    const fields =
      b.fields && typeof b.fields === 'object' ? (b.fields as Record<string, string[]>) : {};
    throw new ApiError(res.status, message, fields, body);
  }
  return body as T;
}

/** A readable message for any thrown value. */
export function errorMessage(err: unknown): string {
  if (err instanceof ApiError) return err.message;
  if (err instanceof Error && err.message) {
    return err.message === 'Failed to fetch'
      ? 'Could not reach the server. Check the connection and try again.'
      : err.message;
  }
  return 'Something went wrong.';
}
