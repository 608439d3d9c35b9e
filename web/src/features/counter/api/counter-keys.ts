export const counterKeys = {
  all: ['counter'] as const,
  plans: () => [...counterKeys.all, 'plans'] as const,
  lines: (planId: string) => [...counterKeys.all, 'lines', planId] as const,
};
