import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { defineAbilityFor } from '@understudy/shared-types';
import { useMemo, useState, type ReactNode } from 'react';
import { authKeys } from '../features/auth/api/keys';
import { useMe } from '../features/auth/api/get-me';
import { AbilityProvider } from '../lib/ability';
import { isApiClientError } from '../lib/api-client';
import { createQueryClient } from '../lib/query-client';

/** A session that ends server-side (expiry, disabled account) or a changed role is picked up by any failing call. */
export function createAppQueryClient(): QueryClient {
  const client: QueryClient = createQueryClient({
    onError: (error) => {
      if (!isApiClientError(error)) return;
      if (error.status === 401 && client.getQueryData(authKeys.me())) client.setQueryData(authKeys.me(), null);
      if (error.status === 403) void client.invalidateQueries({ queryKey: authKeys.me() });
    },
  });
  return client;
}

function SessionAbility({ children }: { children: ReactNode }) {
  const { data: user } = useMe();
  const id = user?.id;
  const role = user?.role;
  const ability = useMemo(() => defineAbilityFor(id && role ? { id, role } : null), [id, role]);
  return <AbilityProvider value={ability}>{children}</AbilityProvider>;
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  return (
    <QueryClientProvider client={client}>
      <SessionAbility>{children}</SessionAbility>
    </QueryClientProvider>
  );
}

