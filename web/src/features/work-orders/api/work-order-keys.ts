import type { WorkOrderListQuery } from '../types';

export const workOrderKeys = {
  all: ['work-orders'] as const,
  lists: () => [...workOrderKeys.all, 'list'] as const,
  list: (query: WorkOrderListQuery) => [...workOrderKeys.lists(), query] as const,
  detail: (id: string) => [...workOrderKeys.all, 'detail', id] as const,
  project: (projectId: string) => [...workOrderKeys.all, 'project', projectId] as const,
  photoFile: (photoId: string) => [...workOrderKeys.all, 'photo-file', photoId] as const,
};
