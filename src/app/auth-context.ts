import { createContext, useContext } from 'react';
import type { User } from '../lib/user';

export type AuthStatus =
  /** first check of the session still running */
  | 'checking'
  | 'signed-in'
  | 'signed-out'
  /** the session couldn't be checked (server unreachable or failing) */
  | 'unknown';

export interface AuthState {
  status: AuthStatus;
  user: User | null;
  /** why the status is 'unknown' */
  error: unknown;
  recheck: () => void;
  rechecking: boolean;
  /** the path a deliberate sign-out started from, until the person has left it */
  signedOutFrom: string | null;
  noteSignOut: (path: string | null) => void;
}

export const AuthContext = createContext<AuthState | null>(null);

export function useAuth(): AuthState {
  const ctx = useContext(AuthContext);
  if (!ctx) throw new Error('useAuth must be used inside <AppProvider>');
  return ctx;
}
