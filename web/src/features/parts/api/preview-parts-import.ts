import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Schemas } from '@/lib/api-types';

export type ImportPreview = Schemas['ImportPreviewResponseDto'];
export type ImportRequest = { file: File; mapping?: Record<string, string>; onProgress?: (percent: number) => void };

export function importForm({ file, mapping }: ImportRequest): FormData {
  const form = new FormData();
  form.append('file', file);
  if (mapping) form.append('mapping', JSON.stringify(mapping));
  return form;
}

export async function previewPartsImport(request: ImportRequest): Promise<ImportPreview> {
  const { data } = await apiClient.post<ImportPreview>('/parts/import/preview', importForm(request), {
    onUploadProgress: (event) => request.onProgress?.(event.total ? Math.round((event.loaded / event.total) * 100) : 0),
  });
  return data;
}

export function usePreviewPartsImport() {
  return useSingleFlightMutation({ mutationFn: previewPartsImport });
}
