import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { RequestError, errorMessage } from '@/hooks/api/request';

/** Loading, error (with the server's own words, e.g. a 403) or the screen built from the data. */
export function QueryScreen<T>({ query, title, children }: { query: UseQueryResult<T>; title: string; children: (data: T) => ReactNode }) {
  if (query.data !== undefined) return <>{children(query.data)}</>;
  if (query.isError) {
    const notFound = query.error instanceof RequestError && query.error.status === 404;
    return (
      <Screen title={notFound ? 'Not found' : title}>
        <Notice tone={notFound ? 'info' : 'danger'} word={notFound ? 'Not found' : 'Cannot load'}>{errorMessage(query.error)}</Notice>
        {notFound ? null : <Button title="Try again" variant="secondary" onPress={() => void query.refetch()} />}
      </Screen>
    );
  }
  return <LoadingView />;
}
