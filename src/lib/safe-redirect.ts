/**
 * Where to go after signing in. Only paths on this site are accepted, so a crafted
 * `?next=https://elsewhere` or `?next=//elsewhere` can't send a person off-site.
 */
const AUTH_PAGES = ['/sign-in', '/sign-up'];

export function safeNextPath(next: string | null | undefined, fallback = '/'): string {
  if (!next) return fallback;
  if (!next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  // Control characters and backslashes have no place in our own paths.
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  if (/[\u0000-\u001f\\]/.test(next)) return fallback;
  const pathOnly = next.split(/[?#]/, 1)[0];
  if (AUTH_PAGES.includes(pathOnly)) return fallback;
  return next;
}

/** `/sign-in?next=…` for the page the person was on. */
export function signInPathFor(location: { pathname: string; search?: string; hash?: string }): string {
  const here = `${location.pathname}${location.search ?? ''}${location.hash ?? ''}`;
  const next = safeNextPath(here, '');
  return next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in';
}
