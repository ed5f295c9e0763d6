import { QueryClient } from '@tanstack/react-query';
import { isApiRequestError } from './api-error';

const MAX_RETRIES = 2;

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      refetchOnWindowFocus: false,
      // A 4xx answer will not change by asking again; network and 5xx failures might.
      retry: (failureCount, error) => {
        if (isApiRequestError(error) && error.status >= 400 && error.status < 500) return false;
        return failureCount < MAX_RETRIES;
      },
    },
    mutations: { retry: false },
  },
});
