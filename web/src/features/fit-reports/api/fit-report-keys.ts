export const fitReportKeys = {
  all: ['fit-reports'] as const,
  selections: (projectId: string) => [...fitReportKeys.all, 'selections', projectId] as const,
  lists: () => [...fitReportKeys.all, 'list'] as const,
  list: (projectId: string) => [...fitReportKeys.lists(), projectId] as const,
  details: () => [...fitReportKeys.all, 'detail'] as const,
  detail: (id: string) => [...fitReportKeys.details(), id] as const,
  compare: (a: string, b: string) => [...fitReportKeys.all, 'compare', a, b] as const,
};
