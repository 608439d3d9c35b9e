import { lazy } from 'react';
import { Navigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSignedInUser } from '@/features/auth/api/get-current-user';

const OwnerHome = lazy(() => import('./owner-home').then((m) => ({ default: m.OwnerHome })));
const EstimatorHome = lazy(() => import('./estimator-home').then((m) => ({ default: m.EstimatorHome })));
const FabricatorHome = lazy(() => import('./fabricator-home').then((m) => ({ default: m.FabricatorHome })));
const CounterHome = lazy(() => import('./counter-home').then((m) => ({ default: m.CounterHome })));

/** Each role lands on the work that is theirs. */
export function HomePage() {
  const user = useSignedInUser();
  switch (user.role) {
    case 'owner':
      return <OwnerHome />;
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
