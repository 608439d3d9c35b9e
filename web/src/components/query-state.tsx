import { Button, Empty, Result, Skeleton } from 'antd';
import type { ReactNode } from 'react';
import { getErrorMessage, getStatus } from '@/lib/api-error';

export type LoadingStateProps = { rows?: number; testId?: string };

export function LoadingState({ rows = 4, testId = 'loading' }: LoadingStateProps) {
  return (
    <div data-testid={testId} aria-busy="true" aria-live="polite">
      <Skeleton active paragraph={{ rows }} />
    </div>
  );
}

export type ErrorStateProps = { error: unknown; onRetry?: () => void; title?: string };

export function ErrorState({ error, onRetry, title }: ErrorStateProps) {
  const status = getStatus(error);
  const resultStatus = status === 403 ? '403' : status === 404 ? '404' : 'error';
  const heading =
    title ??
    (status === 403
      ? 'Your role cannot open this'
      : status === 404
        ? 'Not found in this shop'
        : 'This could not be loaded');
  return (
    <Result
      status={resultStatus}
      title={heading}
      subTitle={getErrorMessage(error)}
      extra={
        onRetry && status !== 403 && status !== 404 ? (
          <Button type="primary" onClick={onRetry}>
            Try again
          </Button>
        ) : undefined
      }
      data-testid="error-state"
    />
  );
}

export type EmptyStateProps = { description: ReactNode; action?: ReactNode };

export function EmptyState({ description, action }: EmptyStateProps) {
  return (
    <Empty image={Empty.PRESENTED_IMAGE_SIMPLE} description={description} data-testid="empty-state">
      {action}
    </Empty>
  );
}

type QueryLike<T> = {
  data: T | undefined;
  isPending: boolean;
  isError: boolean;
  error: unknown;
  refetch: () => unknown;
};

export type QueryStateProps<T> = {
  query: QueryLike<T>;
  isEmpty?: (data: T) => boolean;
  empty?: ReactNode;
  loadingRows?: number;
  children: (data: T) => ReactNode;
};

/** Loading, error (with retry), empty and content in one place for any query. */
export function QueryState<T>({ query, isEmpty, empty, loadingRows, children }: QueryStateProps<T>) {
  if (query.isPending) return <LoadingState rows={loadingRows} />;
  if (query.isError || query.data === undefined)
    return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (isEmpty?.(query.data) && empty) return <>{empty}</>;
  return <>{children(query.data)}</>;
}
