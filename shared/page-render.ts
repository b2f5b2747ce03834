/**
 * The contract between the server and the server-render bundle (src/entry-server.tsx, built by Vite
 * into dist/render): the server hands over who is signed in and the reads a page may need, and gets
 * back the page's HTML and the state the browser starts from. Types only, so neither side imports
 * the other.
 */
import type { PublicUser } from './schemas/auth';
import type { RecipeSort, RecipeSummary } from './schemas/recipes';

/** The reads a server-rendered page may ask for, answered by the same services as the API, as the API's JSON. */
export interface PageReads {
  recipes(q: string, sort: RecipeSort): Promise<{ recipes: RecipeSummary[] }>;
}

export interface PageRenderInput {
  /** the request's path and query */
  url: string;
  user: PublicUser | null;
  reads: PageReads;
}

export interface RenderedPage {
  /** the inner HTML of #root, or null when this page is drawn in the browser only */
  html: string | null;
  /** JSON of PageState, for the page's state script */
  state: string;
}

export type RenderPage = (input: PageRenderInput) => Promise<RenderedPage>;

/** The id of the `<script type="application/json">` that carries PageState into the page. */
export const PAGE_STATE_ID = 'hearthswap-state';
