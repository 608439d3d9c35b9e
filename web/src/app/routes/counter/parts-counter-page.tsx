import { Tabs } from 'antd';
import { PageHeader } from '@/components/page-header';
import { useShop } from '@/features/shop/api/get-shop';
import { CounterBoard } from '@/features/counter/components/counter-board';
import { PartsImport } from '@/features/parts/components/parts-import';
import { PartsTable } from '@/features/parts/components/parts-table';
import { SuppliersTable } from '@/features/parts/components/suppliers-table';

/** The parts counter (owner and counter staff, who keep the catalog): jobs' matched parts lists, parts with stock and bins, suppliers, and supplier file import. */
export function PartsCounterBody() {
  const currency = useShop().data?.currency;
  return (
    <Tabs
      items={[
        { key: 'jobs', label: 'Jobs', children: <CounterBoard currency={currency} /> },
        { key: 'parts', label: 'Parts and stock', children: <PartsTable canEdit currency={currency} /> },
        { key: 'suppliers', label: 'Suppliers', children: <SuppliersTable canEdit /> },
        { key: 'import', label: 'Import CSV', children: <PartsImport /> },
      ]}
    />
  );
}

export function PartsCounterPage() {
  return (
    <>
      <PageHeader title="Parts counter" subtitle="Matched parts lists with stock and bins, reservations, pick lists and supplier imports." />
      <PartsCounterBody />
    </>
  );
}
