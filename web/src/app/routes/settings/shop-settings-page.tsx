import { PageHeader } from '@/components/page-header';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useShop } from '@/features/shop/api/get-shop';
import { ShopSettingsForm } from '@/features/shop/components/shop-settings-form';

export function ShopSettingsPage() {
  const user = useSignedInUser();
  const shop = useShop();
  return (
    <>
      <PageHeader title="Shop settings" subtitle="Units and the rates every quote is built on." />
      {shop.isPending ? (
        <LoadingState rows={8} />
      ) : shop.isError ? (
        <ErrorState error={shop.error} onRetry={() => void shop.refetch()} />
      ) : (
        <ShopSettingsForm shop={shop.data} canEdit={user.role === 'owner'} />
      )}
    </>
  );
}
