import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { PartsCounterBody } from '../counter/parts-counter-page';
import { greeting } from './greeting';

export function CounterHome() {
  const user = useSignedInUser();
  return (
    <>
      <PageHeader eyebrow={user.shop.name} title={greeting(user.name)} subtitle="Matched parts lists, stock and pick lists." />
      <PartsCounterBody />
    </>
  );
}
