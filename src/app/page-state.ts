/**
 * The state a server-rendered page starts from (src/entry-server.tsx writes it, src/main.tsx reads it):
 * the session and the reads the server already answered, and which page the server drew.
 */
import type { DehydratedState } from '@tanstack/react-query';
import { PAGE_STATE_ID } from '../../shared/page-render';

export interface PageState {
  /** the route id drawn on the server (src/app/router.tsx), or null when only the browser draws the page */
  rendered: string | null;
  /** the time zone the server wrote dates in */
  timeZone: string;
  queries: DehydratedState;
}

export function localTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

/** As JSON inside `<script type="application/json">`: no `<` can close the element early. */
export function pageStateJson(state: PageState): string {
  return JSON.stringify(state).replace(/</g, '\\u003c');
}

export function readPageState(doc: Document): PageState | null {
  const text = doc.getElementById(PAGE_STATE_ID)?.textContent;
  if (!text) return null;
  try {
    return JSON.parse(text) as PageState;
  } catch {
    return null;
  }
}
