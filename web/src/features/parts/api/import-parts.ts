import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { importForm, type ImportPreview, type ImportRequest } from './preview-parts-import';
import { partsKeys } from './parts-keys';

export async function importParts(request: ImportRequest): Promise<ImportPreview> {
  const { data } = await apiClient.post<ImportPreview>('/parts/import', importForm(request), {
    onUploadProgress: (event) => request.onProgress?.(event.total ? Math.round((event.loaded / event.total) * 100) : 0),
  });
  return data;
}

export function useImportParts() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: importParts, onSuccess: () => client.invalidateQueries({ queryKey: partsKeys.all }) });
}
