import { queryOptions, useQuery } from '@tanstack/react-query';
import { useObjectUrl } from '@/hooks/use-object-url';
import { apiClient } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

/** The stored photo (the route needs the bearer token, so it is fetched, not linked). */
export async function getMeasurementPhotoFile(photoId: string, signal?: AbortSignal): Promise<Blob> {
  const { data } = await apiClient.get<Blob>(`/measurement-photos/${encodeURIComponent(photoId)}/file`, { signal, responseType: 'blob' });
  return data;
}

export const measurementPhotoFileQueryOptions = (photoId: string) =>
  queryOptions({
    queryKey: measurementKeys.photoFile(photoId),
    queryFn: ({ signal }) => getMeasurementPhotoFile(photoId, signal),
    // a stored photo never changes (a replacement is a new photo)
    staleTime: Infinity,
  });

/** An object URL of the stored photo for <img>, released when the component lets go of it. */
export function useMeasurementPhotoUrl(photoId: string): { url: string | null; isError: boolean } {
  const query = useQuery(measurementPhotoFileQueryOptions(photoId));
  return { url: useObjectUrl(query.data), isError: query.isError };
}
