import { apiClient } from '@/lib/api-client';
import { saveBlob } from '@/lib/download';

export async function downloadPartsCsv(): Promise<void> {
  const { data } = await apiClient.get<Blob>('/parts/export.csv', { responseType: 'blob' });
  saveBlob(data, 'parts-catalog.csv');
}
