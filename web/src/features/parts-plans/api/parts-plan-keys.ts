export const partsPlanKeys = {
  all: ['parts-plans'] as const,
  project: (projectId: string) => [...partsPlanKeys.all, 'project', projectId] as const,
};
