import { localTimeZone, type PageState } from './page-state';

/** What the Kitchen and its rewrite panel keep in sessionStorage starts with this (kitchen-storage.ts, rewrite-storage.ts). */
export const TAB_STATE_PREFIX = 'hearthswap:';

function holdsTabState(storage: Pick<Storage, 'length' | 'key'>): boolean {
  for (let i = 0; i < storage.length; i++) if (storage.key(i)?.startsWith(TAB_STATE_PREFIX)) return true;
  return false;
}

/**
 * Whether this browser's first render will be exactly the server's HTML, so it can hydrate: the
 * Kitchen restores a recipe kept in this tab's sessionStorage (the server can't know it), and dates
 * are written in the server's time zone. Otherwise the browser draws the page itself over the
 * server's HTML.
 */
export function canHydrate(state: PageState, storage: Pick<Storage, 'length' | 'key'> | undefined, timeZone = localTimeZone()): boolean {
  if (!state.rendered || state.timeZone !== timeZone) return false;
  return state.rendered !== 'kitchen' || !storage || !holdsTabState(storage);
}
