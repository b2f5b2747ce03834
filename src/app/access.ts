import type { User, UserRole } from '../lib/user';

/** Who may open each members-only area. The header and the route guards both read this. */
export const PAGE_ROLES = {
  recipeBook: ['cook'],
  myCoach: ['cook'],
  myFoods: ['cook', 'coach'],
  swapLibrary: ['coach'],
  clients: ['coach'],
  admin: ['admin'],
} as const satisfies Record<string, readonly UserRole[]>;

export interface NavItem {
  to: string;
  label: string;
  /** null: shown to everyone, signed in or not */
  roles: readonly UserRole[] | null;
}

export const NAV_ITEMS: readonly NavItem[] = [
  { to: '/', label: 'Kitchen', roles: null },
  { to: '/foods', label: 'Foods', roles: null },
  { to: '/my-foods', label: 'My foods', roles: PAGE_ROLES.myFoods },
  { to: '/recipes', label: 'Recipe book', roles: PAGE_ROLES.recipeBook },
  { to: '/shopping', label: 'Shopping', roles: PAGE_ROLES.recipeBook },
  { to: '/coach', label: 'My coach', roles: PAGE_ROLES.myCoach },
  { to: '/swaps', label: 'Swap library', roles: PAGE_ROLES.swapLibrary },
  { to: '/clients', label: 'Clients', roles: PAGE_ROLES.clients },
  { to: '/admin/users', label: 'People', roles: PAGE_ROLES.admin },
  { to: '/admin/outbox', label: 'Outbox', roles: PAGE_ROLES.admin },
];

export function hasRole(user: User | null | undefined, roles: readonly UserRole[]): boolean {
  return Boolean(user && roles.includes(user.role));
}

export function navItemsFor(user: User | null | undefined): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles === null || hasRole(user, item.roles));
}
