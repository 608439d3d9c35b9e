import { lazy } from 'react';
import { Navigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { LoadingState } from '@/components/query-state';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useCustomers } from '@/features/customers/api/get-customers';
import { useMemberships } from '@/features/members/api/get-memberships';

const OwnerHome = lazy(() => import('./owner-home').then((m) => ({ default: m.OwnerHome })));
const EstimatorHome = lazy(() => import('./estimator-home').then((m) => ({ default: m.EstimatorHome })));
const FabricatorHome = lazy(() => import('./fabricator-home').then((m) => ({ default: m.FabricatorHome })));
const BuilderHome = lazy(() => import('./builder-home').then((m) => ({ default: m.BuilderHome })));
const CounterHome = lazy(() => import('./counter-home').then((m) => ({ default: m.CounterHome })));

/** Each role lands on the work that is theirs. */
export function HomePage() {
  const user = useSignedInUser();
  switch (user.role) {
    case 'owner':
      return <OwnersHome />;
    case 'estimator':
      return <EstimatorHome />;
    case 'fabricator':
      return <FabricatorHome />;
    case 'counter':
      return <CounterHome />;
    case 'customer':
      return <Navigate to={paths.myProjects} replace />;
  }
}

/**
 * An owner alone in the shop whose only customer is themselves (or who has none yet) builds their own truck: their
 * home leads with their projects. Any other shop gets the shop's home.
 */
function OwnersHome() {
  const members = useMemberships();
  const customers = useCustomers({ page: 1, pageSize: 2 });
  if (members.isPending || customers.isPending) return <LoadingState rows={6} />;
  const alone = members.data !== undefined && members.data.length <= 1;
  const onlySelf = customers.data !== undefined && customers.data.items.every((c) => c.ownRecord);
  return alone && onlySelf ? <BuilderHome /> : <OwnerHome />;
}
