/**
 * Every TanStack Query key in one place so invalidation can't drift from fetching.
 * The first element names the area; sign-out drops every area except `auth`.
 */
export const queryKeys = {
  auth: {
    me: ['auth', 'me'] as const,
  },
  foods: {
    all: ['foods'] as const,
    search: (q: string) => ['foods', 'search', q] as const,
    detail: (id: number | string) => ['foods', 'detail', String(id)] as const,
    mine: () => ['foods', 'mine'] as const,
  },
  recipes: {
    all: ['recipes'] as const,
    list: () => ['recipes', 'list'] as const,
    detail: (id: number | string) => ['recipes', 'detail', String(id)] as const,
    versions: (id: number | string) => ['recipes', 'detail', String(id), 'versions'] as const,
  },
  swaps: {
    all: ['swaps'] as const,
    list: () => ['swaps', 'list'] as const,
  },
  coach: {
    /** the signed-in cook's coach, targets and published swaps */
    mine: () => ['coach', 'mine'] as const,
    invitation: (token: string) => ['coach', 'invitation', token] as const,
  },
  clients: {
    all: ['clients'] as const,
    list: () => ['clients', 'list'] as const,
    detail: (id: number | string) => ['clients', 'detail', String(id)] as const,
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
