/**
 * Every TanStack Query key in one place so invalidation can't drift from fetching; the query
 * options built from them live in src/lib/api/. The first element names the area; sign-out drops
 * every area except `auth`.
 */
import type { RecipeSort } from '../../shared/schemas/recipes';

export const queryKeys = {
  auth: {
    me: ['auth', 'me'] as const,
  },
  foods: {
    all: ['foods'] as const,
    search: (q: string, limit: number) => ['foods', 'search', q, limit] as const,
    detail: (id: number | string) => ['foods', 'detail', String(id)] as const,
    mine: () => ['foods', 'mine'] as const,
  },
  recipes: {
    all: ['recipes'] as const,
    list: () => ['recipes', 'list'] as const,
    listed: (q: string, sort: RecipeSort) => ['recipes', 'list', { q, sort }] as const,
    detail: (id: number | string) => ['recipes', 'detail', String(id)] as const,
    versions: (id: number | string) => ['recipes', 'detail', String(id), 'versions'] as const,
    /** one saved version; versions never change once saved */
    version: (id: number | string, number: number) => ['recipes', 'detail', String(id), 'versions', number] as const,
    /** under the recipe's detail key, so whatever refreshes a recipe refreshes its prep too */
    prep: (id: number | string, number: number | null, portions: number | null) => ['recipes', 'detail', String(id), 'prep', number, portions] as const,
  },
  swaps: {
    all: ['swaps'] as const,
    list: () => ['swaps', 'list'] as const,
  },
  coach: {
    /** the signed-in cook's coach, targets and published swaps */
    mine: () => ['coach', 'mine'] as const,
    /** the same answer read down to the per-meal targets the rewrite starts from */
    mealTargets: () => ['coach', 'mine', 'targets'] as const,
    invitation: (token: string) => ['coach', 'invitation', token] as const,
  },
  clients: {
    all: ['clients'] as const,
    list: () => ['clients', 'list'] as const,
    details: () => ['clients', 'detail'] as const,
    detail: (id: number | string) => ['clients', 'detail', String(id)] as const,
    versions: (clientId: number) => ['clients', 'detail', String(clientId), 'versions'] as const,
    bodyStats: (clientId: number) => ['clients', 'detail', String(clientId), 'body-stats'] as const,
  },
  comments: {
    thread: (recipeId: number, number: number) => ['comments', String(recipeId), number] as const,
    unread: () => ['comments', 'unread'] as const,
  },
  rewrite: {
    model: (requestSignature: string) => ['rewrite', 'model', requestSignature] as const,
  },
  admin: {
    all: ['admin'] as const,
    users: () => ['admin', 'users'] as const,
    outbox: () => ['admin', 'outbox'] as const,
  },
} as const;

/** The area a key belongs to ("auth", "recipes", …). */
export function queryArea(key: readonly unknown[]): string | undefined {
  return typeof key[0] === 'string' ? key[0] : undefined;
}
