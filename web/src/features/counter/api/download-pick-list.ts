import { apiClient } from '@/lib/api-client';
import { saveBlob } from '@/lib/download';

/** Fetches the pick list CSV with the session and hands it to the browser as a download. */
export async function downloadPickList(planId: string): Promise<void> {
  const { data } = await apiClient.get<Blob>(`/parts-plans/${encodeURIComponent(planId)}/pick-list.csv`, { responseType: 'blob' });
  saveBlob(data, 'pick-list.csv');
}
