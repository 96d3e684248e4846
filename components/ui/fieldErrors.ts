// Form errors keyed by dotted field path ("client.email"), from zod issues or the API's `fields`.
export type FieldErrors = Record<string, string>;

/** The first message for each field path; issues without a path go under "" (the whole form). */
export function issuesToFieldErrors(
  issues: readonly { path: readonly PropertyKey[]; message: string }[],
): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.');
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

/** The API's `{ fields: { name: [messages] } }` in the same form. */
export function apiFieldsToFieldErrors(fields: Record<string, string[] | string>): FieldErrors {
  const out: FieldErrors = {};
  for (const [key, messages] of Object.entries(fields)) {
    const first = Array.isArray(messages) ? messages[0] : messages;
    if (first) out[key] = first;
  }
  return out;
}
