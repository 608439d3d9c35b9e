import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Project, UpdateProjectInput } from '../types';
import { projectKeys } from './project-keys';

export type UpdateProjectArgs = { id: string; changes: UpdateProjectInput };

export async function updateProject({ id, changes }: UpdateProjectArgs): Promise<Project> {
  const { data } = await apiClient.patch<Project>(`/projects/${encodeURIComponent(id)}`, changes, {
    skipErrorNotification: true,
  });
  return data;
}

export function useUpdateProject({ onSuccess }: { onSuccess?: (project: Project) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateProject,
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.detail(project.id), project);
      void queryClient.invalidateQueries({ queryKey: projectKeys.lists() });
      onSuccess?.(project);
    },
  });
}
