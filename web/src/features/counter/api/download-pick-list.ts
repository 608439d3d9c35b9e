import { apiClient } from '@/lib/api-client';
import { saveBlob } from '@/lib/download';

/** "Harlan Ridgeback 1978: Kestrel 5.3 V8 swap plan v2" -> "pick-list-harlan-ridgeback-1978-kestrel-5-3-v8-swap-plan-v2.csv". */
export function pickListFileName(jobName?: string): string {
  const slug = (jobName ?? '')
    .normalize('NFKD')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
    .replace(/-+$/, '');
  return slug ? `pick-list-${slug}.csv` : 'pick-list.csv';
}

/** Fetches the pick list CSV with the session and hands it to the browser as a download named after the job. */
export async function downloadPickList(planId: string, jobName?: string): Promise<void> {
  const { data } = await apiClient.get<Blob>(`/parts-plans/${encodeURIComponent(planId)}/pick-list.csv`, { responseType: 'blob' });
  saveBlob(data, pickListFileName(jobName));
}
