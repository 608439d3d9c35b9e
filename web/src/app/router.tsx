import { lazy, Suspense, type ComponentType, type ReactNode } from 'react';
import { createBrowserRouter, Outlet, RouterProvider, type RouteObject } from 'react-router-dom';
import { paths, toSignIn } from '@/config/paths';
import { setUnauthorizedHandler } from '@/lib/api-client';
import type { Role } from '@swapwright/shared';
import { RequireAuth, RequireRole } from './guards';
import { sectionRoles } from './navigation';
import { FullPageSplash } from './splash';

/** React.lazy for a named export. */
function lazyNamed<M extends Record<string, unknown>, K extends keyof M>(load: () => Promise<M>, name: K) {
  return lazy(() => load().then((m) => ({ default: m[name] as ComponentType })));
}

const AuthLayout = lazyNamed(() => import('./routes/auth/auth-layout'), 'AuthLayout');
const AppLayout = lazyNamed(() => import('./routes/app/app-layout'), 'AppLayout');
const SignInPage = lazyNamed(() => import('./routes/auth/sign-in-page'), 'SignInPage');
const SignUpPage = lazyNamed(() => import('./routes/auth/sign-up-page'), 'SignUpPage');
const ResetPasswordPage = lazyNamed(() => import('./routes/auth/reset-password-page'), 'ResetPasswordPage');
const AcceptInvitePage = lazyNamed(() => import('./routes/auth/accept-invite-page'), 'AcceptInvitePage');
const HomePage = lazyNamed(() => import('./routes/home/home-page'), 'HomePage');
const ProjectsPage = lazyNamed(() => import('./routes/projects/projects-page'), 'ProjectsPage');
const ProjectDetailPage = lazyNamed(() => import('./routes/projects/project-detail-page'), 'ProjectDetailPage');
const MeasurementSheetPage = lazyNamed(() => import('./routes/measurements/measurement-sheet-page'), 'MeasurementSheetPage');
const MyProjectsPage = lazyNamed(() => import('./routes/projects/my-projects-page'), 'MyProjectsPage');
const CustomersPage = lazyNamed(() => import('./routes/customers/customers-page'), 'CustomersPage');
const MembersPage = lazyNamed(() => import('./routes/members/members-page'), 'MembersPage');
const ShopSettingsPage = lazyNamed(() => import('./routes/settings/shop-settings-page'), 'ShopSettingsPage');
const BackgroundWorkPage = lazyNamed(() => import('./routes/settings/background-work-page'), 'BackgroundWorkPage');
const WorkOrdersPage = lazyNamed(() => import('./routes/work-orders/work-orders-page'), 'WorkOrdersPage');
const WorkOrderPage = lazyNamed(() => import('./routes/work-orders/work-order-page'), 'WorkOrderPage');
const PartsCounterPage = lazyNamed(() => import('./routes/counter/parts-counter-page'), 'PartsCounterPage');
const CatalogPage = lazyNamed(() => import('./routes/catalog/catalog-page'), 'CatalogPage');
const FitReportRoute = lazyNamed(() => import('./routes/fit/fit-report-route'), 'FitReportRoute');
const QuotePage = lazyNamed(() => import('./routes/quotes/quote-page'), 'QuotePage');
const QuoteAnswerPage = lazyNamed(() => import('./routes/quotes/quote-answer-page'), 'QuoteAnswerPage');
const NotFoundPage = lazyNamed(() => import('./routes/not-found-page'), 'NotFoundPage');
const RouteErrorBoundary = lazy(() =>
  import('@/components/route-error-boundary').then((m) => ({ default: m.RouteErrorBoundary })),
);

function SectionError({ section }: { section?: string }) {
  return (
    <Suspense fallback={null}>
      <RouteErrorBoundary section={section} />
    </Suspense>
  );
}

function TopSuspense({ children }: { children: ReactNode }) {
  return <Suspense fallback={<FullPageSplash />}>{children}</Suspense>;
}

/** A guarded section of the app with its own error boundary. */
function section(
  path: string,
  roles: readonly Role[],
  name: string,
  Page: ComponentType,
  redirect?: Partial<Record<Role, string>>,
): RouteObject {
  return {
    path,
    errorElement: <SectionError section={name} />,
    element: (
      <RequireRole roles={roles} redirect={redirect}>
        <Page />
      </RequireRole>
    ),
  };
}

export const routes: RouteObject[] = [
  {
    element: <Outlet />,
    errorElement: <SectionError />,
    children: [
      {
        element: (
          <TopSuspense>
            <AuthLayout />
          </TopSuspense>
        ),
        errorElement: <SectionError section="sign-in" />,
        children: [
          { path: paths.signIn, element: <SignInPage /> },
          { path: paths.signUp, element: <SignUpPage /> },
          { path: paths.resetPassword, element: <ResetPasswordPage /> },
          { path: paths.acceptInvite, element: <AcceptInvitePage /> },
        ],
      },
      {
        path: paths.quoteAnswer,
        element: (
          <TopSuspense>
            <QuoteAnswerPage />
          </TopSuspense>
        ),
        errorElement: <SectionError section="the quote" />,
      },
      {
        element: (
          <RequireAuth>
            <TopSuspense>
              <AppLayout />
            </TopSuspense>
          </RequireAuth>
        ),
        errorElement: <SectionError />,
        children: [
          { index: true, element: <HomePage />, errorElement: <SectionError section="Home" /> },
          section(paths.projects, sectionRoles.projects, 'Projects', ProjectsPage, { customer: paths.myProjects }),
          section(paths.projectDetail, sectionRoles.projectDetail, 'the project', ProjectDetailPage),
          section(paths.projectFit, sectionRoles.projectFit, 'the fit check', FitReportRoute),
          section(paths.projectMeasurements, sectionRoles.projectMeasurements, 'the measurement sheet', MeasurementSheetPage),
          section(paths.myProjects, sectionRoles.myProjects, 'My projects', MyProjectsPage),
          section(paths.customers, sectionRoles.customers, 'Customers', CustomersPage),
          section(paths.quoteDetail, sectionRoles.quoteDetail, 'the quote', QuotePage),
          section(paths.workOrders, sectionRoles.workOrders, 'Work orders', WorkOrdersPage),
          section(paths.workOrderDetail, sectionRoles.workOrderDetail, 'the work order', WorkOrderPage),
          section(paths.partsCounter, sectionRoles.partsCounter, 'Parts counter', PartsCounterPage),
          section(paths.catalog, sectionRoles.catalog, 'Catalog', CatalogPage),
          section(paths.members, sectionRoles.members, 'Members', MembersPage),
          section(paths.shopSettings, sectionRoles.shopSettings, 'Shop settings', ShopSettingsPage),
          section(paths.backgroundWork, sectionRoles.backgroundWork, 'Background work', BackgroundWorkPage),
          { path: '*', element: <NotFoundPage /> },
        ],
      },
    ],
  },
];

export const router = createBrowserRouter(routes);

setUnauthorizedHandler((next) => {
  void router.navigate(toSignIn(next), { replace: true });
});

export function AppRouter() {
  return <RouterProvider router={router} />;
}
