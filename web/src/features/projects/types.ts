export type ProjectStatus = 'intake' | 'measuring' | 'checking' | 'quoting' | 'approved' | 'building' | 'done';

export const projectStatuses: readonly ProjectStatus[] = [
  'intake',
  'measuring',
  'checking',
  'quoting',
  'approved',
  'building',
  'done',
];

export type ProjectUse = 'street' | 'tow' | 'off-road' | 'strip';

export const projectUses: readonly ProjectUse[] = ['street', 'tow', 'off-road', 'strip'];

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
  status?: ProjectStatus;
  placement?: ProjectPlacement | null;
};
