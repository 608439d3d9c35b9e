import { apiClient } from '@/lib/api-client';
import type { MeasurementPhoto } from '../types';

export type UploadMeasurementPhotosInput = {
  files: File[];
  /** The point the photos show. */
  pointId?: string;
  /** A customer's photo these replace (fabricator or owner). */
  replacesPhotoId?: string;
  /** 0 to 1 as the bytes go out. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
};

/** Sends photos as multipart form data (field `photos`); the API checks each by its content. */
export async function uploadMeasurementPhotos(projectId: string, input: UploadMeasurementPhotosInput): Promise<MeasurementPhoto[]> {
  const form = new FormData();
  for (const file of input.files) form.append('photos', file, file.name);
  if (input.pointId) form.append('pointId', input.pointId);
  if (input.replacesPhotoId) form.append('replacesPhotoId', input.replacesPhotoId);
  const { data } = await apiClient.post<MeasurementPhoto[]>(`/projects/${encodeURIComponent(projectId)}/measurement-sheet/photos`, form, {
    signal: input.signal,
    // a phone photo on shop Wi-Fi can take longer than the default request timeout
    timeout: 120_000,
    skipErrorNotification: true,
    onUploadProgress: (event) => {
      if (event.total) input.onProgress?.(event.loaded / event.total);
    },
  });
  return data;
}
