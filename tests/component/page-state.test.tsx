/**
 * The state a server-drawn page hands the browser (src/app/page-state.ts) and when the browser may
 * hydrate the server's HTML rather than draw over it (src/app/can-hydrate.ts).
 */
import { describe, expect, it } from 'vitest';
import { PAGE_STATE_ID } from '../../shared/page-render';
import { canHydrate, TAB_STATE_PREFIX } from '../../src/app/can-hydrate';
import { pageStateJson, readPageState, type PageState } from '../../src/app/page-state';
import { KITCHEN_STORAGE_KEY } from '../../src/features/analysis/kitchen-storage';
import { REWRITE_STORAGE_KEY } from '../../src/features/rewrite/rewrite-storage';

const KITCHEN: PageState = { rendered: 'kitchen', timeZone: 'Europe/Paris', queries: { mutations: [], queries: [] } };

describe('the page state', () => {
  it('survives a title that would close its script element', () => {
    const state = { ...KITCHEN, queries: { mutations: [], queries: [] }, note: '</script><script>alert(1)</script>' };
    const json = pageStateJson(state);
    expect(json).not.toContain('<');
    const doc = document.implementation.createHTMLDocument('t');
    doc.body.innerHTML = `<script type="application/json" id="${PAGE_STATE_ID}">${json}</script>`;
    expect(readPageState(doc)).toEqual(state);
  });

  it('is null when the page has none (npm run dev) or it does not parse', () => {
    const doc = document.implementation.createHTMLDocument('t');
    expect(readPageState(doc)).toBeNull();
    doc.body.innerHTML = `<script type="application/json" id="${PAGE_STATE_ID}">{not json</script>`;
    expect(readPageState(doc)).toBeNull();
  });
});

describe('hydrating the server’s HTML', () => {
  it('hydrates the Kitchen of a fresh tab in the server’s time zone', () => {
    expect(canHydrate(KITCHEN, sessionStorage, 'Europe/Paris')).toBe(true);
    expect(canHydrate(KITCHEN, undefined, 'Europe/Paris')).toBe(true);
  });

  it('draws over it when this tab keeps a Kitchen recipe or a rewrite the server could not know', () => {
    sessionStorage.setItem(KITCHEN_STORAGE_KEY, '{}');
    expect(canHydrate(KITCHEN, sessionStorage, 'Europe/Paris')).toBe(false);
    sessionStorage.clear();
    sessionStorage.setItem(REWRITE_STORAGE_KEY, '{}');
    expect(canHydrate(KITCHEN, sessionStorage, 'Europe/Paris')).toBe(false);
    // the recipe book keeps nothing in the tab
    expect(canHydrate({ ...KITCHEN, rendered: 'recipe-book' }, sessionStorage, 'Europe/Paris')).toBe(true);
  });

  it('recognises every key the Kitchen and its rewrite panel keep', () => {
    expect(KITCHEN_STORAGE_KEY.startsWith(TAB_STATE_PREFIX)).toBe(true);
    expect(REWRITE_STORAGE_KEY.startsWith(TAB_STATE_PREFIX)).toBe(true);
  });

  it('draws over it when the browser’s time zone is not the server’s (dates would differ) or nothing was drawn', () => {
    expect(canHydrate({ ...KITCHEN, rendered: 'recipe-book' }, sessionStorage, 'America/Chicago')).toBe(false);
    expect(canHydrate({ ...KITCHEN, rendered: null }, sessionStorage, 'Europe/Paris')).toBe(false);
  });
});
