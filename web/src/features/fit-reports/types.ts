import type { CheckStatus, FitReport as SharedFitReport, FitSettings, FitSpec, Finding, Placement } from '@swapwright/shared';

/** Counts of checks by status. */
export type FitSummary = Partial<Record<CheckStatus, number>> & { total?: number };

/** What the fit engine returns for one placement (the same function runs on the server and here). */
export type FitReport = SharedFitReport;

export type FitInputsSnapshot = {
  spec: FitSpec;
  /** The shop's threshold overrides at the run. */
  settingsOverrides?: Partial<FitSettings>;
  settings?: Partial<FitSettings>;
  placementSource?: 'project' | 'proposed' | 'chassis-default';
  /** Inputs the server filled in or left out, in words. */
  notes?: string[];
};

/** A stored report: one row of the history. */
export type FitReportListItem = {
  id: string;
  projectId: string;
  createdAt: string;
  createdById?: string | null;
  createdBy?: { id: string; name: string } | null;
  /** Who ran it, by name (list summaries). */
  createdByName?: string | null;
  placementSource?: 'project' | 'proposed' | 'chassis-default';
  /** Counts by status (the API calls them `counts`). */
  counts?: FitSummary;
  engineVersion?: string;
  placement?: Placement | null;
  summary?: FitSummary;
  okCount?: number;
  tightCount?: number;
  failsCount?: number;
  unknownCount?: number;
  totalCount?: number;
  worstStatus?: CheckStatus;
};

/** A stored report in full: results plus the inputs it was built on. */
export type StoredFitReport = FitReportListItem & {
  results: FitReport;
  inputsSnapshot: FitInputsSnapshot;
};

/** The parts the project picked for the fit check, besides engine, chassis and transmission. */
export type FitSelections = {
  oilPanId: string | null;
  oilPickupId: string | null;
  oilPumpId: string | null;
  controllerId: string | null;
  accessoryDriveId: string | null;
  /** The catalog mount adapter used on both engine mounts. */
  mountAdapterId?: string | null;
  timingSetAdvanceDeg?: number | null;
  [key: string]: unknown;
};

export type FitSelectionKey = 'oilPanId' | 'oilPickupId' | 'oilPumpId' | 'controllerId' | 'accessoryDriveId' | 'mountAdapterId';

/** One check's change between two reports. */
export type FindingChange = {
  checkId: string;
  title: string;
  group?: string;
  before: Pick<Finding, 'status' | 'measured' | 'unit'> | null;
  after: Pick<Finding, 'status' | 'measured' | 'unit'> | null;
};

export type FitReportComparison = {
  a: FitReportListItem;
  b: FitReportListItem;
  changes: FindingChange[];
};

/** Counts of a stored report, whichever way the list gives them. */
export function summaryOf(item: FitReportListItem): FitSummary | undefined {
  if (item.summary) return item.summary;
  if (item.counts) return item.counts;
  if (item.okCount === undefined) return undefined;
  return { ok: item.okCount, tight: item.tightCount, fails: item.failsCount, unknown: item.unknownCount, total: item.totalCount };
}

/** The API's full report ({ report, inputs }) or the older ({ results, inputsSnapshot }) in one shape. */
export function normalizeStoredReport(raw: StoredFitReport & { report?: FitReport; inputs?: FitInputsSnapshot }): StoredFitReport {
  const results = raw.results ?? raw.report;
  const inputsSnapshot = raw.inputsSnapshot ?? raw.inputs;
  return { ...raw, results: results as FitReport, inputsSnapshot: inputsSnapshot as FitInputsSnapshot, summary: raw.summary ?? raw.counts ?? results?.summary };
}
