import type { ProjectStatus, SwapUse as ProjectUse } from '@swapwright/shared';

export { PROJECT_STATUSES as projectStatuses, SWAP_USES as projectUses, type ProjectStatus, type SwapUse as ProjectUse } from '@swapwright/shared';

export type ProjectGoals = {
  use: ProjectUse;
  targetPowerKw: number | null;
  revLimitRpm: number | null;
  budgetCents: number | null;
};

export type ProjectPlacement = { setbackMm: number; heightMm: number; tiltDeg: number };

export type Project = {
  id: string;
  title: string;
  status: ProjectStatus;
  customerId: string;
  customer: { id: string; name: string };
  vehicleDescription: string;
  chassisModelId: string | null;
  engineProfileId: string | null;
  transmissionId: string | null;
  goals: ProjectGoals;
  placement: ProjectPlacement | null;
  createdAt: string;
  updatedAt: string;
};

export type ProjectSort = 'title' | 'status' | 'createdAt' | 'updatedAt';

export const projectSortFields: readonly ProjectSort[] = ['title', 'status', 'createdAt', 'updatedAt'];

export type ProjectListQuery = {
  page: number;
  pageSize: number;
  sort?: ProjectSort;
  order?: 'asc' | 'desc';
  status?: ProjectStatus;
  customerId?: string;
  search?: string;
};

export type CreateProjectInput = {
  title: string;
  customerId: string;
  vehicleDescription: string;
  goals: ProjectGoals;
};

export type UpdateProjectInput = Partial<CreateProjectInput> & {
  engineProfileId?: string | null;
  chassisModelId?: string | null;
  transmissionId?: string | null;
  status?: ProjectStatus;
  placement?: ProjectPlacement | null;
};
