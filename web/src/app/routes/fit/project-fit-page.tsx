import { Alert, Button, Card, Col, Flex, Row, Space, Typography } from 'antd';
import { useRef, useState } from 'react';
import type { PlacementRemedy } from '@swapwright/shared';
import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { toCatalogKind, toProjectDetail, toProjectMeasurements } from '@/config/paths';
import { belowHeader } from '@/config/theme';
import { useUnits } from '@/hooks/use-units';
import { getErrorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notifier';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useFitSelections } from '@/features/fit-reports/api/get-fit-selections';
import { useRunFitReport } from '@/features/fit-reports/api/run-fit-report';
import { ChecksTable } from '@/features/fit-reports/components/checks-table';
import { FrontView } from '@/features/fit-reports/components/front-view';
import { PlacementControls } from '@/features/fit-reports/components/placement-controls';
import { ProposalBounds } from '@/features/fit-reports/components/proposal-bounds';
import { ReportCaution } from '@/features/fit-reports/components/report-caution';
import { ReportHistory } from '@/features/fit-reports/components/report-history';
import { ReportSummaryCard } from '@/features/fit-reports/components/report-summary-card';
import { SelectionsPanel } from '@/features/fit-reports/components/selections-panel';
import { ShortfallList } from '@/features/fit-reports/components/shortfall-list';
import { SideViewCard } from '@/features/fit-reports/components/side-view-card';
import { useFitSelectionEdits } from '@/features/fit-reports/hooks/use-fit-selection-edits';
import { useOpenReport } from '@/features/fit-reports/hooks/use-open-report';
import { usePlacementPreview } from '@/features/fit-reports/hooks/use-placement-preview';
import { ReportInputSources } from '@/features/measurements/components/report-input-sources';
import { useProject } from '@/features/projects/api/get-project';
import { useUpdateProject } from '@/features/projects/api/update-project';
import type { Project } from '@/features/projects/types';
import { SampleCatalogOffer } from '@/features/catalog/components/sample-catalog-offer';
import { canEditCatalog, canEditProjects, canRunFitCheck, isFitReadOnly } from '../../navigation';
import { engineSpecOf, pansOf, pickupsOf, selectionSlots, useFitCatalog, usePartNames } from './use-fit-selection-slots';
import '@/features/fit-reports/components/fit-print.css';

const roundTo100th = (v: number) => Math.round(v * 100) / 100;

export function ProjectFitPage() {
  const { projectId = '' } = useParams();
  const user = useSignedInUser();
  const units = useUnits();
  const canRun = canRunFitCheck(user.role);
  // customers get the stored report only; the catalog and selections answer them 403
  const readOnly = isFitReadOnly(user.role);
  const project = useProject(projectId);
  const selections = useFitSelections(projectId, { enabled: !readOnly });
  const { reports, report, reportId, openReport } = useOpenReport(projectId);
  const catalog = useFitCatalog(!readOnly);
  const stored = report.data;
  const preview = usePlacementPreview(stored);
  const { shown, spec, shownSpec, placement, fitWindow, proposal } = preview;
  const partNames = usePartNames(spec, catalog);
  /** Parts or placement changed since the report on screen was stored. */
  const [stale, setStale] = useState(false);
  const summaryRef = useRef<HTMLDivElement>(null);
  const placementRef = useRef<HTMLDivElement>(null);

  const run = useRunFitReport({
    onSuccess: (r) => {
      void project.refetch();
      openReport(r.id);
      preview.reset();
      setStale(false);
    },
  });
  const edits = useFitSelectionEdits({
    projectId,
    selections: selections.data,
    spec,
    catalogPans: pansOf(catalog),
    catalogPickups: pickupsOf(catalog),
    partName: (id) => partNames[id]?.name,
    onSaved: () => setStale(true),
  });
  const updateProject = useUpdateProject({ onSuccess: () => setStale(true) });

  if (project.isPending) return <LoadingState rows={10} />;
  if (project.isError) return <ErrorState error={project.error} onRetry={() => void project.refetch()} />;
  const p: Project = project.data;

  const savePlacement = async () => {
    if (!placement) return;
    const rounded = { setbackMm: roundTo100th(placement.setbackMm), heightMm: roundTo100th(placement.heightMm), tiltDeg: roundTo100th(placement.tiltDeg) };
    await updateProject.mutateAsync({ id: p.id, changes: { placement: rounded } });
    notifySuccess({ title: 'Placement saved', description: 'Run the fit check to store a report at this placement.' });
  };

  /** The list re-sorts at the moved placement, so the page brings the preview's counts into view instead. */
  const previewMove = (remedy: PlacementRemedy) => {
    preview.tryRemedy(remedy);
    summaryRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
    summaryRef.current?.focus({ preventScroll: true });
  };
  const goToPlacement = () => placementRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });

  const sel = selections.data;
  const slots = selectionSlots({
    project: p,
    catalog,
    selections: sel,
    selectionsLoading: selections.isPending,
    engineSpec: engineSpecOf(catalog, p.engineProfileId) ?? spec?.engine,
    canPickSelections: canRun,
    canPickProjectParts: canEditProjects(user.role),
    canAddToCatalog: canEditCatalog(user.role),
    savingSelections: edits.saving,
    savingProject: updateProject.isPending,
    onSelect: (patch) => void edits.save(patch),
    onProjectPart: (changes) => void updateProject.mutateAsync({ id: p.id, changes }),
  });
  const catalogEmpty =
    !readOnly && !catalog.engines.loading && !catalog.chassis.loading && (catalog.engines.options.length === 0 || catalog.chassis.options.length === 0);
  const chosenIds = [sel?.oilPanId, sel?.oilPickupId, sel?.oilPumpId, sel?.controllerId, sel?.accessoryDriveId, sel?.mountAdapterId].filter((x): x is string => Boolean(x));

  // The API refuses a run without both; the page says so before the press.
  const needsFirst = !p.engineProfileId && !p.chassisModelId ? 'an engine and a chassis' : !p.engineProfileId ? 'an engine' : !p.chassisModelId ? 'a chassis' : null;

  return (
    <div className="fit-page">
      <Typography.Text className="fit-control">
        <Link to={toProjectDetail(p.id)} className="back-link">← {p.title}</Link>
      </Typography.Text>
      <PageHeader
        eyebrow={p.customer?.name}
        title="Fit check"
        subtitle={`${p.title} · ${p.vehicleDescription}`}
        extra={
          <Space className="fit-control">
            <Button onClick={() => window.print()} disabled={!shown}>
              Print
            </Button>
            {canRun && (
              <Button type="primary" loading={run.isPending} disabled={Boolean(needsFirst)} onClick={() => run.mutate(projectId)}>
                Run fit check
              </Button>
            )}
          </Space>
        }
      />
      <Flex vertical gap={16}>
        <ReportCaution caution={shown?.caution} safety={shown?.safety} />

        {!readOnly && (
          <Card title="What goes in" className="fit-control fit-selections-card" size="small">
            {selections.isError ? (
              <ErrorState error={selections.error} onRetry={() => void selections.refetch()} />
            ) : (
              <Flex vertical gap={12}>
                {catalogEmpty && (
                  <SampleCatalogOffer
                    canStart={user.role === 'owner'}
                    title="Nothing to choose from yet"
                    extra={<Link to={toCatalogKind('engines')}>Or add your own engine and chassis in the catalog</Link>}
                  />
                )}
                <SelectionsPanel slots={slots} saving={edits.saving || updateProject.isPending} />
              </Flex>
            )}
          </Card>
        )}

        {canRun && needsFirst && !catalogEmpty && (
          <Typography.Text type="secondary" className="fit-control" data-testid="run-needs">
            Choose {needsFirst} under “What goes in” to run the fit check.
          </Typography.Text>
        )}
        {run.isError && <Alert type="error" showIcon title="The fit check could not run" description={getErrorMessage(run.error)} />}
        {stale && stored && (
          <Alert
            className="fit-control"
            type="info"
            showIcon
            title="Inputs changed since this report"
            description="Run the fit check again to store a report with the new parts or placement."
            data-testid="stale-report"
          />
        )}

        {reports.isPending || (reportId && report.isPending) ? (
          <LoadingState rows={8} testId="fit-report-loading" />
        ) : reports.isError ? (
          <ErrorState error={reports.error} onRetry={() => void reports.refetch()} />
        ) : !stored || !shown || !shownSpec || !placement ? (
          <Card>
            <EmptyState description={canRun ? 'No fit check yet. Choose the parts above, then run the fit check.' : 'No fit check has been run for this project yet.'} />
          </Card>
        ) : (
          <>
            <ReportSummaryCard
              ref={summaryRef}
              stored={stored}
              shown={shown}
              isPreview={preview.isPreview}
              previewActions={!readOnly && <Button onClick={goToPlacement}>Save or undo this move</Button>}
            />

            <Card title={`Shortfalls (${shown.shortfalls.length}), worst first`} className="fit-shortfalls-card">
              <ShortfallList
                shortfalls={shown.shortfalls}
                parts={partNames}
                onUsePart={canRun ? (r, id) => void edits.choosePart(r, id) : undefined}
                onTryPlacement={canRun ? previewMove : undefined}
                chosenIds={chosenIds}
                busyPartId={edits.busyPartId}
              />
            </Card>

            <Row gutter={[16, 16]}>
              <Col xs={24} xl={readOnly ? 24 : 16}>
                <SideViewCard spec={shownSpec} findings={shown.findings} window={fitWindow} proposed={proposal?.placement} />
              </Col>
              {!readOnly && (
                <Col xs={24} xl={8}>
                  <Card className="fit-control" ref={placementRef} style={belowHeader}>
                    <PlacementControls
                      value={placement}
                      onChange={preview.setPreview}
                      saved={p.placement ?? preview.storedPlacement}
                      proposed={proposal?.placement ?? fitWindow?.best?.placement ?? null}
                      isPreview={preview.isPreview}
                      onSave={canRun ? () => void savePlacement() : undefined}
                      saving={updateProject.isPending}
                      onReset={preview.reset}
                    />
                    {proposal && (
                      <div style={{ marginTop: 12 }}>
                        <ProposalBounds proposal={proposal} findings={shown.findings} />
                      </div>
                    )}
                  </Card>
                </Col>
              )}
              <Col xs={24} xl={12}>
                <Card title="Front view: widths" className="fit-front-card">
                  <FrontView spec={shownSpec} minGapMm={shown.settings?.minRailGapMm} />
                </Card>
              </Col>
            </Row>

            <Card title="Every check" className="fit-checks-card">
              <ChecksTable findings={shown.findings} />
            </Card>

            <Card title="Where the chassis figures came from" className="fit-sources-card">
              <ReportInputSources
                inputs={stored.inputs.chassisInputs}
                checks={stored.report.findings}
                formatLength={(mm) => units.formatLength(mm)}
                sheetLink={<Link to={toProjectMeasurements(p.id)}>Open the measurement sheet</Link>}
              />
            </Card>
          </>
        )}

        <Card title="Report history" className="fit-control fit-history-card">
          <ReportHistory projectId={projectId} currentId={reportId} onOpen={openReport} />
        </Card>
      </Flex>
    </div>
  );
}
