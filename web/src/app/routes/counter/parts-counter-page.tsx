import { Tabs } from 'antd';
import { PageHeader } from '@/components/page-header';
import { CounterBoard } from '@/features/counter/components/counter-board';
import { PartsImport } from '@/features/parts/components/parts-import';
import { PartsTable } from '@/features/parts/components/parts-table';

/** The parts counter: jobs' matched parts lists, the parts with stock and bins, and supplier file import. */
export function PartsCounterBody() {
  return (
    <Tabs
      items={[
        { key: 'jobs', label: 'Jobs', children: <CounterBoard /> },
        { key: 'parts', label: 'Parts and stock', children: <PartsTable /> },
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
