import { Alert } from 'antd';
import { PageHeader } from '@/components/page-header';
import { ErrorState, LoadingState } from '@/components/query-state';
import { AuditLogTable } from '@/features/audit/components/audit-log-table';
import { DeviationLimitsForm } from '@/features/measurements/components/deviation-limits-form';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useShop } from '@/features/shop/api/get-shop';
import { QuoteTermsForm } from '@/features/shop/components/quote-terms-form';
import { ShopSettingsForm } from '@/features/shop/components/shop-settings-form';
import { hasShopRates } from '@/features/shop/types';

export function ShopSettingsPage() {
  const user = useSignedInUser();
  const shop = useShop();
  return (
    <>
      <PageHeader title="Shop settings" subtitle="Units, the rates every quote is built on, and when a measurement is flagged for a second look." />
      {shop.isPending ? (
        <LoadingState rows={8} />
      ) : shop.isError ? (
        <ErrorState error={shop.error} onRetry={() => void shop.refetch()} />
      ) : hasShopRates(shop.data) ? (
        <ShopSettingsForm shop={shop.data} canEdit={user.role === 'owner'} />
      ) : (
        <Alert type="info" showIcon title="The shop's rates are shown to its staff only." />
      )}
      {user.role === 'owner' && (
        <div style={{ marginTop: 16 }}>
          <QuoteTermsForm canEdit currency={shop.data && hasShopRates(shop.data) ? shop.data.currency : undefined} />
        </div>
      )}
      {user.role !== 'customer' && (
        <div style={{ marginTop: 16 }}>
          <DeviationLimitsForm canEdit={user.role === 'owner'} />
        </div>
      )}
      {user.role === 'owner' && (
        <div style={{ marginTop: 24 }}>
          <AuditLogTable currency={shop.data && hasShopRates(shop.data) ? shop.data.currency : undefined} />
        </div>
      )}
    </>
  );
}
