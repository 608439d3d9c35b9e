import { Alert, Card, Grid, Tabs } from 'antd';
import { useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { useListSearchParams } from '@/hooks/use-list-search-params';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { CatalogItemDrawer } from '@/features/catalog/components/catalog-item-drawer';
import { CatalogTable } from '@/features/catalog/components/catalog-table';
import { SampleCatalogOffer } from '@/features/catalog/components/sample-catalog-offer';
import { kindDefinitions } from '@/features/catalog/lib/catalog-kinds';
import { catalogKinds, type CatalogItem, type CatalogKind } from '@/features/catalog/types';
import { canEditCatalog } from '../../navigation';

const noSort: readonly never[] = [];

export function CatalogPage() {
  const user = useSignedInUser();
  const canEdit = canEditCatalog(user.role);
  const [params, setParams] = useListSearchParams({ sortFields: noSort, filters: ['kind'] });
  const kind: CatalogKind = catalogKinds.find((k) => k === params.kind) ?? 'engines';
  const [editing, setEditing] = useState<{ item: CatalogItem | null } | null>(null);
  // From antd's xl (1200 px) the kinds stand in a column beside the table, every one in sight; narrower, they run
  // along the top and antd's own "…" menu holds the ones that do not fit.
  const beside = Grid.useBreakpoint().xl === true;

  return (
    <>
      <PageHeader
        title="Catalog"
        subtitle="The shop’s own engines, chassis, transmissions and parts, with the figures the fit check reads."
      />
      {!canEdit && (
        <Alert
          style={{ marginBottom: 16 }}
          type="info"
          showIcon
          title="You can look up every entry"
          description="The owner, the estimators and the parts counter keep the catalog. Ask one of them to add an entry or change a figure."
        />
      )}
      <Card>
        <Tabs
          aria-label="Catalog kinds"
          activeKey={kind}
          tabPlacement={beside ? 'start' : 'top'}
          onChange={(next) => setParams({ kind: next, page: 1, search: undefined })}
          items={catalogKinds.map((k) => ({
            key: k,
            label: kindDefinitions[k].label,
            children:
              k === kind ? (
                <CatalogTable
                  key={kind}
                  kind={kind}
                  query={{ page: params.page, pageSize: params.pageSize, search: params.search }}
                  onQueryChange={setParams}
                  canEdit={canEdit}
                  onEdit={(item) => setEditing({ item })}
                  onCreate={() => setEditing({ item: null })}
                  emptyOffer={<SampleCatalogOffer canStart={user.role === 'owner'} title={`No ${kindDefinitions[kind].label.toLowerCase()} in your catalog yet`} />}
                />
              ) : null,
          }))}
        />
      </Card>
      {canEdit && <CatalogItemDrawer kind={kind} open={editing !== null} item={editing?.item ?? null} onClose={() => setEditing(null)} />}
    </>
  );
}
