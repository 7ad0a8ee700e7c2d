import { QueryClient } from '@tanstack/react-query';

import { ApiError } from '@/shared/api/client';

/** Shared stale times, so screens agree on how fresh "fresh" is. */
export const staleTime = { short: 10_000, normal: 60_000, long: 5 * 60_000 } as const;

/** Retry only what may pass next time: network failures and 5xx. Never 4xx, never mutations. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (failureCount >= 2) return false;
  if (!(error instanceof ApiError)) return false;
  return error.status === 0 || error.status >= 500;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: staleTime.normal, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}
