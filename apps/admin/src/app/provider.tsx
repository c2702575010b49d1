import { QueryClientProvider } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { useClearSignedInUser } from '../features/auth/hooks/use-clear-signed-in-user';
import { api } from '../lib/api-client';
import { queryClient } from '../lib/query-client';

function SignInWatch() {
  const clearSignedInUser = useClearSignedInUser();
  useEffect(() => api.onUnauthorized(clearSignedInUser), [clearSignedInUser]);
  return null;
}

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <SignInWatch />
      {children}
    </QueryClientProvider>
  );
}
