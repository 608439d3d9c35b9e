import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Job } from '../types';
import { jobKeys } from './job-keys';

/** Puts a stopped job back in the queue (owner only); the API answers 409 when it is not stopped. */
export async function retryJob(id: string): Promise<Job> {
  const { data } = await apiClient.post<Job>(`/jobs/${encodeURIComponent(id)}/retry`);
  return data;
}

export function useRetryJob({ onSuccess }: { onSuccess?: (job: Job) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: retryJob,
    onSuccess: (job) => onSuccess?.(job),
    onSettled: () => queryClient.invalidateQueries({ queryKey: jobKeys.lists() }),
  });
}
