import type { ReactNode } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';

type AppProviderProps = {
  queryClient: QueryClient;
  children: ReactNode;
};

/** The providers every screen relies on (tests render through the same one). */
export function AppProvider({ queryClient, children }: AppProviderProps) {
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
