import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CreateProjectInput, Project } from '../types';
import { projectKeys } from './project-keys';

export async function createProject(input: CreateProjectInput): Promise<Project> {
  const { data } = await apiClient.post<Project>('/projects', input, { skipErrorNotification: true });
  return data;
}

export function useCreateProject({ onSuccess }: { onSuccess?: (project: Project) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: createProject,
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.detail(project.id), project);
      void queryClient.invalidateQueries({ queryKey: projectKeys.lists() });
      onSuccess?.(project);
    },
  });
}
