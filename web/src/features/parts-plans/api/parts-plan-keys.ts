export const partsPlanKeys = {
  all: ['parts-plans'] as const,
  project: (projectId: string) => [...partsPlanKeys.all, 'project', projectId] as const,
  /** The same route as the customer reads it: the customer's view, a shape of its own, cached apart. */
  customerView: (projectId: string) => [...partsPlanKeys.all, 'customer-view', projectId] as const,
};
