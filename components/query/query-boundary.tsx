import type { ReactNode } from 'react';

import { ApiError } from '@/shared/api/client';

import { ErrorState, LoadingState } from '../ui/query-states';

/** What the boundary reads of a React Query result. */
export type QueryLike<T> = {
  isPending: boolean;
  isLoading?: boolean;
  isError: boolean;
  error: unknown;
  data: T | undefined;
  refetch: () => unknown;
};

export type QueryBoundaryProps<T> = {
  query: QueryLike<T>;
  /** What the query loads, in words: `station` gives "Loading the station…", "Station not found", "The station could not be loaded". */
  noun: string;
  /** False when the address's id cannot name anything (not a positive whole number): "Station not found" without asking. */
  validId?: boolean;
  loadingLabel?: string;
  errorTitle?: string;
  /** Further queries the view needs; each counts while it loads (a disabled one does not) and has its own error title. */
  alongside?: readonly { query: QueryLike<unknown>; errorTitle: string }[];
  /** Why this person may not use the view (someone else's station on an editing screen), shown as "Read-only"; null lets them in. */
  refuse?: (data: T) => string | null;
  /** The view, given the loaded data. */
  children: (data: T) => ReactNode;
};

const capital = (words: string) => words.charAt(0).toUpperCase() + words.slice(1);

/**
 * The states of a screen that shows one loaded thing: an id that names nothing, loading, not found (a 404),
 * another error (with Try again), someone else's thing on an owner's screen, and the data. Routes hand it their query and draw only the data.
 */
export function QueryBoundary<T>({
  query,
  noun,
  validId = true,
  loadingLabel,
  errorTitle,
  alongside = [],
  refuse,
  children,
}: QueryBoundaryProps<T>) {
  const notFound = `${capital(noun)} not found`;
  if (!validId) return <ErrorState title={notFound} error={new Error(`This address does not name a ${noun}.`)} />;
  if (query.isPending || alongside.some((other) => other.query.isLoading)) {
    return <LoadingState label={loadingLabel ?? `Loading the ${noun}…`} />;
  }
  // a failed refetch keeps showing the data it already has
  if (query.isError && query.data === undefined) {
    const missing = query.error instanceof ApiError && query.error.status === 404;
    return (
      <ErrorState
        title={missing ? notFound : (errorTitle ?? `The ${noun} could not be loaded`)}
        error={query.error}
        onRetry={missing ? undefined : () => query.refetch()}
      />
    );
  }
  const failed = alongside.find((other) => other.query.isError);
  if (failed) return <ErrorState title={failed.errorTitle} error={failed.query.error} onRetry={() => failed.query.refetch()} />;
  const data = query.data as T;
  const refusal = refuse?.(data);
  if (refusal) return <ErrorState title="Read-only" error={new Error(refusal)} />;
  return <>{children(data)}</>;
}
