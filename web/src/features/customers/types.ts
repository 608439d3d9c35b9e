export type Customer = {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  notes: string | null;
  userId: string | null;
  createdAt: string;
  updatedAt: string;
};

export type CustomerSort = 'name' | 'email' | 'createdAt' | 'updatedAt';

export const customerSortFields: readonly CustomerSort[] = ['name', 'email', 'createdAt', 'updatedAt'];

export type CustomerListQuery = {
  page: number;
  pageSize: number;
  sort?: CustomerSort;
  order?: 'asc' | 'desc';
  search?: string;
};

export type CustomerInput = { name: string; email?: string; phone?: string; notes?: string };
