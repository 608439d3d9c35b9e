import { queryOptions, useQuery } from '@tanstack/react-query';
import { useObjectUrl } from '@/hooks/use-object-url';
import { apiClient } from '@/lib/api-client';
import { workOrderKeys } from './work-order-keys';

/** A check photo's file (the route needs the bearer token, so it is fetched, not linked). */
export async function getCheckPhotoFile(photoId: string, signal?: AbortSignal): Promise<Blob> {
  const { data } = await apiClient.get<Blob>(`/work-order-photos/${encodeURIComponent(photoId)}/file`, { signal, responseType: 'blob' });
  return data;
}

export const checkPhotoFileQueryOptions = (photoId: string) =>
  // a stored photo never changes
  queryOptions({ queryKey: workOrderKeys.photoFile(photoId), queryFn: ({ signal }) => getCheckPhotoFile(photoId, signal), staleTime: Infinity });

export function useCheckPhotoUrl(photoId: string): { url: string | null; isError: boolean } {
  const query = useQuery(checkPhotoFileQueryOptions(photoId));
  return { url: useObjectUrl(query.data), isError: query.isError };
}
