// Where to go after signing in: only a path inside this app, never another site or the sign-in page.
export function safeCallback(raw: string | string[] | undefined, fallback = '/jobs'): string {
  const value = Array.isArray(raw) ? raw[0] : raw;
  if (!value) return fallback;
  let path = value;
  try {
    // next-auth hands us absolute URLs; keep only the path part.
    if (/^https?:\/\//i.test(value)) {
      const url = new URL(value);
      path = `${url.pathname}${url.search}${url.hash}`;
    }
  } catch {
    return fallback;
  }
  if (!path.startsWith('/') || path.startsWith('//') || path.startsWith('/\\')) return fallback;
  if (path.startsWith('/sign-in') || path.startsWith('/api/')) return fallback;
  return path;
}
