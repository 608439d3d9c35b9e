import { pickupForNewPan, type FitSpec, type OilPickupSpec, type PartRemedy, type Placement, type PlacementRemedy } from '@swapwright/shared';
import { Alert, Button, Card, Col, Flex, Row, Space, Tag, Typography } from 'antd';
import { useDeferredValue, useEffect, useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { toProjectDetail } from '@/config/paths';
import { getErrorMessage } from '@/lib/api-error';
import { formatDateTime } from '@/lib/dates';
import { notifySuccess } from '@/lib/notifier';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { useFitReport } from '@/features/fit-reports/api/get-fit-report';
import { useFitReports } from '@/features/fit-reports/api/get-fit-reports';
import { useFitSelections } from '@/features/fit-reports/api/get-fit-selections';
import { useRunFitReport } from '@/features/fit-reports/api/run-fit-report';
import { useUpdateFitSelections } from '@/features/fit-reports/api/update-fit-selections';
import { ChecksTable } from '@/features/fit-reports/components/checks-table';
import { FrontView } from '@/features/fit-reports/components/front-view';
import { PlacementControls, samePlacement } from '@/features/fit-reports/components/placement-controls';
import { ReportCaution } from '@/features/fit-reports/components/report-caution';
import { ReportHistory, SummaryTags } from '@/features/fit-reports/components/report-history';
import { SelectionsPanel, type SelectionSlot } from '@/features/fit-reports/components/selections-panel';
import { ShortfallList } from '@/features/fit-reports/components/shortfall-list';
import { SideView } from '@/features/fit-reports/components/side-view';
import { fitWindowFor, previewFitCheck, withPlacement } from '@/features/fit-reports/lib/fit-engine';
import { partsOfSpec, selectionKeyFor } from '@/features/fit-reports/lib/remedies';
import type { FitSelectionKey, FitSelections } from '@/features/fit-reports/types';
import { useProject } from '@/features/projects/api/get-project';
import { useUpdateProject } from '@/features/projects/api/update-project';
import type { Project } from '@/features/projects/types';
import { canEditProjects, canRunFitCheck, isFitReadOnly } from '../../navigation';
import { engineSpecOf, panOf, pickupsOf, useFitCatalog } from './use-fit-selection-slots';
import '@/features/fit-reports/components/fit-print.css';

/** The fields the selections PUT accepts; it replaces the whole selection, so every one is sent. */
const SELECTION_FIELDS = [
  'oilPanId',
  'oilPickupId',
  'oilPumpId',
  'controllerId',
  'accessoryDriveId',
  'mountAdapterId',
  'driveshaft',
  'timingSetAdvanceDeg',
  'topSpeedKph',
  'tireDiameterMm',
  'axleRatio',
  'continuousPowerKw',
] as const;

function selectionBody(current: FitSelections | undefined, patch: Partial<FitSelections>): Partial<FitSelections> {
  const body: Record<string, unknown> = {};
  for (const f of SELECTION_FIELDS) {
    const v = f in patch ? patch[f] : current?.[f];
    if (v !== undefined) body[f] = v;
  }
  return body as Partial<FitSelections>;
}

function settingsOf(report: { results: { settings?: unknown }; inputsSnapshot: { settingsOverrides?: unknown; settings?: unknown } }) {
  return (report.results.settings ?? report.inputsSnapshot.settingsOverrides ?? report.inputsSnapshot.settings ?? undefined) as
    | Parameters<typeof previewFitCheck>[2]
    | undefined;
}

export function ProjectFitPage() {
  const { projectId = '' } = useParams();
  const user = useSignedInUser();
  const canRun = canRunFitCheck(user.role);
  const canPickProjectParts = canEditProjects(user.role);
  // customers get the stored report only; the catalog and selections answer them 403
  const readOnly = isFitReadOnly(user.role);
  const project = useProject(projectId);
  const selections = useFitSelections(projectId, { enabled: !readOnly });
  const reports = useFitReports(projectId);
  const [openId, setOpenId] = useState<string | undefined>();
  const latestId = reports.data?.[0]?.id;
  const reportId = openId ?? latestId;
  const report = useFitReport(reportId);
  const catalog = useFitCatalog(!readOnly);
  const [preview, setPreview] = useState<Placement | null>(null);
  const [stale, setStale] = useState(false);
  const [busyPartId, setBusyPartId] = useState<string | null>(null);

  const run = useRunFitReport({
    onSuccess: (r) => {
      void project.refetch();
      setOpenId(r.id);
      setPreview(null);
      setStale(false);
    },
  });
  const updateSelections = useUpdateFitSelections({ onSuccess: () => setStale(true) });
  const updateProject = useUpdateProject({ onSuccess: () => setStale(true) });

  const stored = report.data;
  const spec: FitSpec | undefined = stored?.inputsSnapshot.spec;
  const settings = stored ? settingsOf(stored) : undefined;
  const storedPlacement = stored?.results.placement ?? spec?.placement ?? null;
  const placement = preview ?? storedPlacement;
  const isPreview = Boolean(preview && storedPlacement && !samePlacement(preview, storedPlacement));

  useEffect(() => setPreview(null), [reportId]);

  const shown = useMemo(() => {
    if (!stored || !spec) return null;
    if (!isPreview || !preview) return stored.results;
    try {
      return previewFitCheck(spec, preview, settings);
    } catch {
      return stored.results;
    }
  }, [stored, spec, isPreview, preview, settings]);

  const tilt = useDeferredValue(placement?.tiltDeg ?? 0);
  const fitWindow = useMemo(() => {
    if (!spec || !storedPlacement) return null;
    try {
      return fitWindowFor(spec, storedPlacement.setbackMm, tilt, settings);
    } catch {
      return null;
    }
  }, [spec, storedPlacement, tilt, settings]);

  const shownSpec = useMemo(() => (spec && placement ? withPlacement(spec, placement) : undefined), [spec, placement]);
  const parts = useMemo(() => {
    const fromSpec = partsOfSpec(spec);
    for (const i of [...catalog.pans.items, ...catalog.pickups.items, ...catalog.pumps.items, ...catalog.controllers.items])
      fromSpec[i.id] ??= { id: i.id, name: i.name };
    return fromSpec;
  }, [spec, catalog.pans.items, catalog.pickups.items, catalog.pumps.items, catalog.controllers.items]);

  if (project.isPending) return <LoadingState rows={10} />;
  if (project.isError) return <ErrorState error={project.error} onRetry={() => void project.refetch()} />;
  const p: Project = project.data;

  const sel = selections.data;
  const putSelection = async (patch: Partial<FitSelections>) => {
    await updateSelections.mutateAsync({ projectId, selections: selectionBody(sel, patch) });
  };

  const onUsePart = async (remedy: PartRemedy, partId: string) => {
    const key = selectionKeyFor[remedy.category];
    if (!key) return;
    const patch: Partial<FitSelections> = { [key]: partId };
    let extra = '';
    if (key === 'oilPanId') {
      // the pickup must sit in the new pan's sump
      const pan = spec?.candidates?.oilPans?.find((x) => x.id === partId) ?? panOf(catalog, partId);
      const pickups: OilPickupSpec[] = [...(spec?.candidates?.oilPickups ?? []), ...pickupsOf(catalog)];
      const current = pickups.find((x) => x.id === sel?.oilPickupId) ?? spec?.oilPickup;
      const choice = pan ? pickupForNewPan(pan, current, pickups) : null;
      if (choice?.action === 'change') {
        patch.oilPickupId = choice.pickup.id;
        extra = ` with the matching pickup ${choice.pickup.name}`;
      }
    }
    setBusyPartId(partId);
    try {
      await putSelection(patch);
      notifySuccess({ title: `Now using ${parts[partId]?.name ?? 'the part'}${extra}`, description: 'Run the fit check again to see the change.' });
    } finally {
      setBusyPartId(null);
    }
  };

  const onTryPlacement = (r: PlacementRemedy) => {
    if (!placement) return;
    const next = { ...placement };
    if (r.axis === 'height') next.heightMm += r.changeBy;
    else if (r.axis === 'setback') next.setbackMm += r.changeBy;
    else next.tiltDeg += r.changeBy;
    setPreview(next);
  };

  const savePlacement = async () => {
    if (!placement) return;
    const rounded = {
      setbackMm: Math.round(placement.setbackMm * 100) / 100,
      heightMm: Math.round(placement.heightMm * 100) / 100,
      tiltDeg: Math.round(placement.tiltDeg * 100) / 100,
    };
    await updateProject.mutateAsync({ id: p.id, changes: { placement: rounded } });
    notifySuccess({ title: 'Placement saved', description: 'Run the fit check to store a report at this placement.' });
  };

  const engineSpec = engineSpecOf(catalog, p.engineProfileId) ?? spec?.engine;
  const canPick = canRun;
  const slot = (key: FitSelectionKey, label: string, options: SelectionSlot['options'], loading: boolean): SelectionSlot => ({
    key,
    label,
    value: (sel?.[key] as string | null | undefined) ?? null,
    options,
    loading: loading || selections.isPending,
    disabled: !canPick || updateSelections.isPending,
    onChange: (v) => void putSelection({ [key]: v }),
  });
  const projectSlot = (key: 'engineProfileId' | 'chassisModelId' | 'transmissionId', label: string, options: SelectionSlot['options'], loading: boolean): SelectionSlot => ({
    key,
    label,
    value: p[key],
    options,
    loading,
    disabled: !canPickProjectParts || updateProject.isPending,
    onChange: (v) => void updateProject.mutateAsync({ id: p.id, changes: { [key]: v } as never }),
  });
  const slots: SelectionSlot[] = [
    projectSlot('engineProfileId', 'Engine', catalog.engines.options, catalog.engines.loading),
    projectSlot('chassisModelId', 'Chassis', catalog.chassis.options, catalog.chassis.loading),
    projectSlot('transmissionId', 'Transmission', catalog.transmissions.options, catalog.transmissions.loading),
    slot('oilPanId', 'Oil pan', catalog.pans.options, catalog.pans.loading),
    slot('oilPickupId', 'Oil pickup', catalog.pickups.options, catalog.pickups.loading),
    slot('oilPumpId', 'Oil pump', catalog.pumps.options, catalog.pumps.loading),
    slot('controllerId', 'Engine controller', catalog.controllers.options, catalog.controllers.loading),
    slot('accessoryDriveId', 'Accessory drive', (engineSpec?.accessoryDrives ?? []).map((d) => ({ value: d.id, label: d.name })), false),
    slot('mountAdapterId', 'Mount adapter', catalog.mountAdapters.options, catalog.mountAdapters.loading),
  ];

  const chosenIds = [sel?.oilPanId, sel?.oilPickupId, sel?.oilPumpId, sel?.controllerId, sel?.accessoryDriveId, sel?.mountAdapterId].filter((x): x is string => Boolean(x));
  const minRailGap = shown?.settings?.minRailGapMm;

  return (
    <div className="fit-page">
      <Typography.Text className="fit-control">
        <Link to={toProjectDetail(p.id)}>← {p.title}</Link>
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
              <Button type="primary" loading={run.isPending} onClick={() => run.mutate(projectId)}>
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
              <SelectionsPanel slots={slots} saving={updateSelections.isPending || updateProject.isPending} />
            )}
          </Card>
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
        ) : !stored || !shown || !spec || !shownSpec || !placement ? (
          <Card>
            <EmptyState description={canRun ? 'No fit check yet. Choose the parts above, then run the fit check.' : 'No fit check has been run for this project yet.'} />
          </Card>
        ) : (
          <>
            <Card
              className="fit-report-summary"
              size="small"
              title={
                <Flex gap={8} align="center" wrap>
                  <span>{isPreview ? 'Preview at the new placement' : 'Report'}</span>
                  {isPreview ? <Tag color="gold">Preview, not saved</Tag> : <Tag>Stored {formatDateTime(stored.createdAt)}</Tag>}
                  <Typography.Text type="secondary" style={{ fontSize: 12, fontWeight: 400 }}>
                    engine {shown.engineVersion}
                  </Typography.Text>
                </Flex>
              }
              extra={<SummaryTags summary={shown.summary} />}
            >
              {(stored.inputsSnapshot.notes?.length ?? 0) > 0 && (
                <ul style={{ margin: 0, paddingLeft: 18 }}>
                  {stored.inputsSnapshot.notes?.map((n) => (
                    <li key={n}>
                      <Typography.Text type="secondary">{n}</Typography.Text>
                    </li>
                  ))}
                </ul>
              )}
            </Card>

            <Card title={`Shortfalls (${shown.shortfalls.length}), worst first`} className="fit-shortfalls-card">
              <ShortfallList
                shortfalls={shown.shortfalls}
                parts={parts}
                onUsePart={canPick ? (r, id) => void onUsePart(r, id) : undefined}
                onTryPlacement={canRun ? onTryPlacement : undefined}
                chosenIds={chosenIds}
                busyPartId={busyPartId}
              />
            </Card>

            <Row gutter={[16, 16]}>
              <Col xs={24} xl={readOnly ? 24 : 16}>
                <Card title="Side view" className="fit-side-card">
                  <SideView spec={shownSpec} findings={shown.findings} window={fitWindow} proposed={fitWindow?.best?.placement ?? null} />
                  {fitWindow && !fitWindow.columns.some((c) => c.feasible) && (
                    <Alert
                      style={{ marginTop: 8 }}
                      type="info"
                      showIcon
                      data-testid="no-fit-window"
                      title="No clear window near this placement"
                      description={`At ${fitWindow.tiltDeg.toFixed(1)}° tilt no crank height clears every clearance check within the setbacks searched. Work through the shortfalls (a different pan, hood or firewall work) and run again.`}
                    />
                  )}
                </Card>
              </Col>
              {!readOnly && (
                <Col xs={24} xl={8}>
                  <Card className="fit-control">
                    <PlacementControls
                      value={placement}
                      onChange={setPreview}
                      saved={p.placement ?? storedPlacement}
                      proposed={fitWindow?.best?.placement ?? null}
                      isPreview={isPreview}
                      onSave={canRun ? () => void savePlacement() : undefined}
                      saving={updateProject.isPending}
                      onReset={() => setPreview(null)}
                    />
                  </Card>
                </Col>
              )}
              <Col xs={24} xl={12}>
                <Card title="Front view: widths" className="fit-front-card">
                  <FrontView spec={shownSpec} minGapMm={minRailGap} />
                </Card>
              </Col>
            </Row>

            <Card title="Every check" className="fit-checks-card">
              <ChecksTable findings={shown.findings} />
            </Card>
          </>
        )}

        <Card title="Report history" className="fit-control fit-history-card">
          <ReportHistory projectId={projectId} currentId={reportId} onOpen={setOpenId} />
        </Card>
      </Flex>
    </div>
  );
}
