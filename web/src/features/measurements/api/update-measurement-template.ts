import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { MeasurementTemplate, MeasurementTemplateBody } from '../types';
import { measurementKeys } from './measurement-keys';

/** Replaces the shop's template of a chassis model (every sheet of that model follows it). */
export async function updateMeasurementTemplate(chassisId: string, body: MeasurementTemplateBody): Promise<MeasurementTemplate> {
  const { data } = await apiClient.put<MeasurementTemplate>(`/chassis/${encodeURIComponent(chassisId)}/measurement-template`, body);
  return data;
}

export function useUpdateMeasurementTemplate(chassisId: string) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: MeasurementTemplateBody) => updateMeasurementTemplate(chassisId, body),
    onSuccess: (template) => {
      client.setQueryData(measurementKeys.template(chassisId), template);
      void client.invalidateQueries({ queryKey: measurementKeys.sheets() });
    },
  });
}
