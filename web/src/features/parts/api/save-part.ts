import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Part } from './get-parts';
import { partsKeys } from './parts-keys';

export type NewPart = RequestBodyOf<'/api/parts', 'post'>;
export type PartChanges = RequestBodyOf<'/api/parts/{id}', 'patch'>;

export async function createPart(input: NewPart): Promise<Part> {
  const { data } = await apiClient.post<Part>('/parts', input, { skipErrorNotification: true });
  return data;
}

export async function updatePart({ id, changes }: { id: string; changes: PartChanges }): Promise<Part> {
  const { data } = await apiClient.patch<Part>(`/parts/${encodeURIComponent(id)}`, changes, { skipErrorNotification: true });
  return data;
}

/** Creates the part, or saves the changes of the one with `id`; the parts lists refresh either way. */
export function useSavePart({ onSuccess }: { onSuccess?: (part: Part) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (input: { id?: string; body: NewPart }) => (input.id ? updatePart({ id: input.id, changes: input.body }) : createPart(input.body)),
    onSuccess: (part) => {
      void queryClient.invalidateQueries({ queryKey: partsKeys.all });
      onSuccess?.(part);
    },
  });
}
