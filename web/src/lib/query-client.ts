import { QueryClient } from '@tanstack/react-query';
import { getStatus } from '@/lib/api-error';

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // A 4xx will not get better by asking again.
        retry: (failureCount, error) => {
          const status = getStatus(error);
          if (status !== null && status >= 400 && status < 500) return false;
          return failureCount < 2;
        },
      },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
