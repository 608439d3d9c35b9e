import { DEMO_FIT_SPEC } from '@swapwright/shared/fixtures';
import { screen, waitFor, within } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { storedFitReportStub, userStub } from '@/test/fixtures';
import { authKeys } from '@/features/auth/api/auth-keys';
import type { FitReportListItem, StoredFitReport } from '@/features/fit-reports/types';
import type { Project } from '@/features/projects/types';
import type { Role } from '@swapwright/shared';
import { RequireRole } from '../../../guards';
import { sectionRoles } from '../../../navigation';
import { ProjectFitPage } from '../project-fit-page';

const project: Project = {
  id: 'p1',
  title: 'Shop truck swap',
  status: 'fit-checked',
  customerId: 'cust-1',
  customer: { id: 'cust-1', name: 'A customer' },
  forMyself: false,
  vehicleDescription: 'Long-bed pickup',
  chassisModelId: 'ch-1',
  engineProfileId: 'en-1',
  transmissionId: null,
  goals: { use: 'street', targetPowerKw: null, revLimitRpm: null, budgetCents: null },
  placement: DEMO_FIT_SPEC.placement,
  createdAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-02T10:00:00.000Z',
};

const stored: StoredFitReport = storedFitReportStub();
const { report: _report, inputs: _inputs, ...summary } = stored;
const listItem: FitReportListItem = summary;

function mockApi() {
  return vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => {
    if (url === '/projects/p1') return { data: project };
    if (url === '/projects/p1/fit-reports') return { data: { items: [listItem], total: 1, page: 1, pageSize: 50 } };
    if (url === '/fit-reports/r1') return { data: stored };
    if (url.startsWith('/catalog/')) return { data: { items: [], total: 0, page: 1, pageSize: 100 } };
    if (url.endsWith('/fit-selections')) return { data: { oilPanId: null, oilPickupId: null, oilPumpId: null, controllerId: null, accessoryDriveId: null } };
    throw new Error(`unexpected GET ${url}`);
  });
}

function renderFitPage(role: Role) {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(authKeys.me(), userStub(role));
  return renderWithApp(
    <Routes>
      <Route
        path="/projects/:projectId/fit"
        element={
          <RequireRole roles={sectionRoles.projectFit}>
            <ProjectFitPage />
          </RequireRole>
        }
      />
    </Routes>,
    { route: '/projects/p1/fit', queryClient },
  );
}

afterEach(() => vi.restoreAllMocks());

describe('fit page by role', () => {
  it('lets a customer read the stored report without any editing or catalog calls', { timeout: 180_000 }, async () => {
    const get = mockApi();
    renderFitPage('customer');
    await screen.findByText('Every check', undefined, { timeout: 20_000 });
    expect(screen.getByText(/Shortfalls \(/)).toBeInTheDocument();
    expect(screen.getByText('Side view')).toBeInTheDocument();
    expect(screen.getByText('Front view: widths')).toBeInTheDocument();
    expect(screen.queryByText('Not part of your role')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Run fit check' })).toBeNull();
    expect(screen.queryByText('What goes in')).toBeNull();
    expect(screen.queryByTestId('placement-controls')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Save placement' })).toBeNull();
    const urls = get.mock.calls.map((c) => c[0] as string);
    expect(urls.some((u) => u.startsWith('/catalog/') || u.endsWith('/fit-selections'))).toBe(false);
  });

  it('gives an estimator the run button, selections and placement controls', { timeout: 180_000 }, async () => {
    mockApi();
    renderFitPage('estimator');
    await screen.findByText('Every check', undefined, { timeout: 20_000 });
    expect(screen.getByRole('button', { name: 'Run fit check' })).toBeEnabled();
    expect(screen.queryByTestId('run-needs')).toBeNull();
    expect(screen.getByText('What goes in')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('button', { name: 'Save placement' })).toBeInTheDocument());
  });
});

describe('fit page with an empty catalog', () => {
  it('offers the owner the sample catalog and links every empty picker to adding that kind', { timeout: 180_000 }, async () => {
    mockApi();
    renderFitPage('owner');
    const offer = await screen.findByTestId('sample-catalog-offer', undefined, { timeout: 20_000 });
    expect(offer).toHaveTextContent('Nothing to choose from yet');
    expect(within(offer).getByRole('button', { name: 'Start from the sample catalog' })).toBeInTheDocument();
    const engineHelp = await screen.findByTestId('empty-engineProfileId');
    expect(within(engineHelp).getByRole('link', { name: 'Add an engine in the catalog' })).toHaveAttribute('href', '/catalog?kind=engines');
    expect(within(screen.getByTestId('empty-chassisModelId')).getByRole('link', { name: 'Add a chassis in the catalog' })).toHaveAttribute('href', '/catalog?kind=chassis');
    expect(within(screen.getByTestId('empty-oilPanId')).getByRole('link', { name: 'Add an oil pan in the catalog' })).toHaveAttribute('href', '/catalog?kind=oil-pans');
  });

  it('tells a fabricator, who does not keep the catalog, whom to ask', { timeout: 180_000 }, async () => {
    mockApi();
    renderFitPage('fabricator');
    const offer = await screen.findByTestId('sample-catalog-offer', undefined, { timeout: 20_000 });
    expect(within(offer).queryByRole('button', { name: 'Start from the sample catalog' })).toBeNull();
    expect(await screen.findByTestId('empty-engineProfileId')).toHaveTextContent('ask the owner, an estimator or the parts counter to add an engine');
  });
});
