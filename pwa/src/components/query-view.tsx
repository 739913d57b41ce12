import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { isApiError } from '../lib/api-error';
import { useOnline } from '../hooks/use-online';
import { ErrorPanel, LoadingPanel, OfflinePanel } from './state-panels';

interface QueryViewProps<T> {
  query: UseQueryResult<T>;
  /** Noun for the loading line, e.g. "projects". */
  what: string;
  /** What the offline panel says, e.g. when the list will appear. */
  offlineNote: string;
  isEmpty: (data: T) => boolean;
  empty: ReactNode;
  children: (data: T) => ReactNode;
}

/** Picks the right state for a server read: loading, offline, error, empty or data. */
export function QueryView<T>({ query, what, offlineNote, isEmpty, empty, children }: QueryViewProps<T>) {
  const online = useOnline();
  if (query.data !== undefined) {
    return <>{isEmpty(query.data) ? empty : children(query.data)}</>;
  }
  const offlineError = isApiError(query.error) && query.error.kind === 'offline';
  if (!online || offlineError || query.fetchStatus === 'paused') {
    return <OfflinePanel>{offlineNote}</OfflinePanel>;
  }
  if (query.isError) {
    return <ErrorPanel message={query.error.message} onRetry={() => void query.refetch()} />;
  }
  return <LoadingPanel what={what} />;
}
