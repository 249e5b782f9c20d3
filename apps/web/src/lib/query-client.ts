import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './api-error.js';

const isRefusal = (error: unknown) =>
  error instanceof ApiRequestError && error.statusCode >= 400 && error.statusCode < 500;

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 15_000,
      // A refusal will not change on retry; a network blip might.
      retry: (failures, error) => !isRefusal(error) && failures < 2,
      refetchOnWindowFocus: false,
    },
    mutations: { retry: false },
  },
});
