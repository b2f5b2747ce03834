import { MutationCache, QueryCache, QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useMemo, useState, type ReactNode } from 'react';
import { ToastProvider } from '../components/ui/toast';
import { useMe } from '../features/auth/api/get-me';
import { isApiError } from '../lib/api-client';
import { queryArea, queryKeys } from '../lib/query-keys';
import { AuthContext, type AuthState } from './auth-context';

const MAX_RETRIES = 2;

export function createQueryClient(): QueryClient {
  // A 401 while we think someone is signed in means the session ended (expired, signed out in
  // another tab): check it again so the header and the guards catch up. A wrong password is also
  // a 401, but then nobody is signed in and there is nothing to re-check.
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (queryArea(query.queryKey) !== 'auth') recheckSessionAfter(error);
      },
    }),
    mutationCache: new MutationCache({ onError: (error) => recheckSessionAfter(error) }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // A 4xx answer won't change by asking again; network trouble and 5xx might.
        retry: (failures, error) => {
          if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
          return failures < MAX_RETRIES;
        },
      },
      mutations: { retry: false },
    },
  });
  function recheckSessionAfter(error: unknown) {
    if (isApiError(error) && error.status === 401 && client.getQueryData(queryKeys.auth.me)) {
      void client.invalidateQueries({ queryKey: queryKeys.auth.me });
    }
  }
  return client;
}

function AuthProvider({ children }: { children: ReactNode }) {
  const me = useMe();
  const [signedOutFrom, setSignedOutFrom] = useState<string | null>(null);
  const state = useMemo<AuthState>(() => {
    const user = me.data ?? null;
    let status: AuthState['status'];
    if (me.status === 'pending') status = 'checking';
    // A failed re-check keeps the answer we already had; a failed first check leaves us not knowing.
    else if (me.status === 'error' && me.data === undefined) status = 'unknown';
    else status = user ? 'signed-in' : 'signed-out';
    return {
      status,
      user,
      error: me.error,
      recheck: () => void me.refetch(),
      rechecking: me.isFetching,
      signedOutFrom,
      noteSignOut: setSignedOutFrom,
    };
  }, [me, signedOutFrom]);
  return <AuthContext.Provider value={state}>{children}</AuthContext.Provider>;
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <QueryClientProvider client={client}>
      <ToastProvider>
        <AuthProvider>{children}</AuthProvider>
      </ToastProvider>
    </QueryClientProvider>
  );
}
