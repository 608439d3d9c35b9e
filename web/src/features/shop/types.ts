import type { UnitSystem } from '@/types/api';

export type Shop = {
  id: string;
  name: string;
  unitSystem: UnitSystem;
  laborRatePerHour: number;
  taxRatePercent: number;
  shopSuppliesPercent: number;
  currency: string;
};

export type UpdateShopInput = Partial<Omit<Shop, 'id'>>;
