import { lazy, Suspense, type ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths, toSignIn } from '@/config/paths';
import { getStatus } from '@/lib/api-error';
import { tokenStorage } from '@/lib/token-storage';
import { useCurrentUser } from '@/features/auth/api/get-current-user';
import type { Role } from '@swapwright/shared';
import { FullPageSplash } from './splash';

// Lazy so the first chunk carries no antd Result artwork.
const ErrorState = lazy(() => import('@/components/query-state').then((m) => ({ default: m.ErrorState })));
const Forbidden = lazy(() => import('./forbidden').then((m) => ({ default: m.Forbidden })));

export type RequireAuthProps = { children: ReactNode };

/** Signed-in people only; everyone else goes to sign-in and comes back afterwards. */
export function RequireAuth({ children }: RequireAuthProps) {
  const location = useLocation();
  const user = useCurrentUser();
  const here = location.pathname + location.search;

  if (!tokenStorage.hasSession()) return <Navigate to={toSignIn(here)} replace />;
  if (user.isPending) return <FullPageSplash label="Opening your shop…" />;
  if (user.isError) {
    if (getStatus(user.error) === 401) return <Navigate to={toSignIn(here)} replace />;
    return (
      <Suspense fallback={<FullPageSplash />}>
        <ErrorState error={user.error} onRetry={() => void user.refetch()} title="Your account could not be loaded" />
      </Suspense>
    );
  }
  return <>{children}</>;
}

export type RequireRoleProps = {
  roles: readonly Role[];
  /** Send these roles elsewhere instead of refusing (e.g. a customer to their own projects). */
  redirect?: Partial<Record<Role, string>>;
  children?: ReactNode;
};

/** Role-guarded section: shows a clear refusal instead of an empty or broken page. */
export function RequireRole({ roles, redirect, children }: RequireRoleProps) {
  const { data: user } = useCurrentUser();
  if (!user) return <Navigate to={paths.signIn} replace />;
  if (!roles.includes(user.role)) {
    const to = redirect?.[user.role];
    if (to) return <Navigate to={to} replace />;
    return (
      <Suspense fallback={null}>
        <Forbidden />
      </Suspense>
    );
  }
  return <>{children ?? <Outlet />}</>;
}

export type RedirectIfSignedInProps = { children: ReactNode };

/** Sign-in and sign-up are pointless when already signed in. */
export function RedirectIfSignedIn({ children }: RedirectIfSignedInProps) {
  const { data: user } = useCurrentUser();
  const location = useLocation();
  if (user) {
    const next = new URLSearchParams(location.search).get('next');
    return <Navigate to={next && next.startsWith('/') && !next.startsWith('//') ? next : paths.home} replace />;
  }
  return <>{children}</>;
}
