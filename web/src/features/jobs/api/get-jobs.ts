import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { JobPage, JobQuery } from '../types';
import { jobKeys } from './job-keys';

/** While work is waiting or running, the list looks again this often to show it finish. */
export const JOBS_REFRESH_MS = 3000;

export async function getJobs(query: JobQuery, signal?: AbortSignal): Promise<JobPage> {
  const { data } = await apiClient.get<JobPage>('/jobs', { params: query, signal });
  return data;
}

export const jobsQueryOptions = (query: JobQuery) =>
  queryOptions({
    queryKey: jobKeys.list(query),
    queryFn: ({ signal }) => getJobs(query, signal),
    placeholderData: keepPreviousData,
    refetchInterval: (q) => {
      const counts = q.state.data?.counts;
      return counts && counts.queued + counts.running > 0 ? JOBS_REFRESH_MS : false;
    },
  });

/**
 * `pauseRefresh` holds the self-refresh while the person decides something about a row (a confirmation is open): a
 * refresh then could change or drop the row under the open question.
 */
export function useJobs(query: JobQuery, { pauseRefresh = false }: { pauseRefresh?: boolean } = {}) {
  const options = jobsQueryOptions(query);
  return useQuery(pauseRefresh ? { ...options, refetchInterval: false } : options);
}
