import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './client';

/** How long data counts as fresh before a screen that shows it refetches in the background. */
export const STALE = {
  /** Vehicle lists, findings and surveys change while colleagues work; refresh often. */
  short: 30_000,
  /** Members, invitations and workshop settings change rarely. */
  medium: 5 * 60_000,
} as const;

/** Retry network and server trouble, never a 4xx: the same request would fail the same way. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiRequestError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // Most screens are lists a colleague may have just changed.
        staleTime: STALE.short,
        // Keep a left screen's data for a quick return (back navigation) without a spinner.
        gcTime: 10 * 60_000,
        retry: shouldRetry,
        // Returning to the tab after working on the car is exactly when data may be stale.
        refetchOnWindowFocus: true,
        // A shop floor has patchy Wi-Fi; catch up when it comes back.
        refetchOnReconnect: true,
      },
      mutations: {
        // Writes are not retried blindly; creates carry client ids so the user can retry safely.
        retry: false,
      },
    },
  });
}
