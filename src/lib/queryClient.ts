import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api';

/**
 * One QueryClient for the app. Any 401 from any query or mutation means the session is gone:
 * `onSessionLost` sends the person to sign-in. Client errors (4xx) are answers, not glitches,
 * so they are never retried.
 */
export function createQueryClient(onSessionLost: () => void): QueryClient {
  const handle = (error: unknown) => {
    if (isApiError(error, 401)) onSessionLost();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: handle }),
    mutationCache: new MutationCache({ onError: handle }),
    defaultOptions: {
      queries: {
        staleTime: 15_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) => !(isApiError(error) && error.status >= 400 && error.status < 500) && failureCount < 2,
      },
    },
  });
}
