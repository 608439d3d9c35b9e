import { apiClient } from '@/lib/api-client';
import type { WorkOrder } from '../types';

export type UploadCheckPhotoInput = {
  workOrderId: string;
  checkKey: string;
  file: File;
  /** 0 to 1 as the bytes go out. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
};

/** Sends one photo of a check (multipart field `photos`); the API checks it by its content and answers the work order. */
export async function uploadCheckPhoto({ workOrderId, checkKey, file, onProgress, signal }: UploadCheckPhotoInput): Promise<WorkOrder> {
  const form = new FormData();
  form.append('photos', file, file.name);
  const { data } = await apiClient.post<WorkOrder>(`/work-orders/${encodeURIComponent(workOrderId)}/checks/${encodeURIComponent(checkKey)}/photos`, form, {
    signal,
    // a phone photo on shop Wi-Fi can take longer than the default request timeout
    timeout: 120_000,
    skipErrorNotification: true,
    onUploadProgress: (event) => {
      if (event.total) onProgress?.(event.loaded / event.total);
    },
  });
  return data;
}
