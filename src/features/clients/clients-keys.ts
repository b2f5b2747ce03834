import { queryKeys } from '../../lib/query-keys';

/** Keys of this feature's queries, all in the shared `clients` area. */
export const clientsKeys = {
  list: queryKeys.clients.list(),
  versions: (clientId: number) => [...queryKeys.clients.detail(clientId), 'versions'] as const,
  bodyStats: (clientId: number) => [...queryKeys.clients.detail(clientId), 'body-stats'] as const,
  recipe: (recipeId: number) => ['clients', 'recipe', String(recipeId)] as const,
  version: (recipeId: number, number: number) => ['clients', 'recipe', String(recipeId), 'version', number] as const,
  comments: (recipeId: number, number: number) => ['clients', 'recipe', String(recipeId), 'version', number, 'comments'] as const,
} as const;
