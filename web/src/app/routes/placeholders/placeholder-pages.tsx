import { ComingNext } from '@/components/coming-next';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';

export function WorkOrdersPage() {
  return (
    <>
      <PageHeader title="Work orders" subtitle="Operations in order, tightening specs and the checks to record." />
      <ComingNext
        testId="work-orders-placeholder"
        coming="Each approved swap will get a work order here: its operations in order, tightening sequences and sign-off checks."
        now={[
          { label: 'Open the projects', to: paths.projects, description: 'Every swap with its stage, chosen parts and fit check.' },
          { label: 'Look up the catalog', to: paths.catalog, description: 'Engines, chassis and parts with the figures the fit check reads.' },
        ]}
      />
    </>
  );
}
