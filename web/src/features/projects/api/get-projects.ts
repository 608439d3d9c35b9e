import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { ProjectListQuery, ProjectPage } from '../types';
import { projectKeys } from './project-keys';

export async function getProjects(query: ProjectListQuery, signal?: AbortSignal): Promise<ProjectPage> {
  const { data } = await apiClient.get<ProjectPage>('/projects', { params: query, signal });
  return data;
}

export const projectsQueryOptions = (query: ProjectListQuery) =>
  queryOptions({
    queryKey: projectKeys.list(query),
    queryFn: ({ signal }) => getProjects(query, signal),
    placeholderData: keepPreviousData,
  });

export function useProjects(query: ProjectListQuery) {
  return useQuery(projectsQueryOptions(query));
}
