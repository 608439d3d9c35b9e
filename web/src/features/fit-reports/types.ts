import type { FitReport as EngineReport, FitSpec } from '@swapwright/shared';
import type { RequestBodyOf, Schemas } from '@/lib/api-types';

/** What the fit engine returns for one placement (the same function runs on the server and here). */
export type FitReport = EngineReport;

/** One row of the report history. */
export type FitReportListItem = Schemas['FitReportSummaryResponseDto'];

/** Counts of checks by status. */
export type FitSummary = Schemas['FitReportCountsDto'];

/**
 * A stored report as the API answers it; the engine's own report and spec are read with the engine's types
 * (the API returns them exactly as the engine computed and took them).
 */
export type StoredFitReport = Omit<Schemas['FitReportResponseDto'], 'report' | 'inputs'> & {
  report: FitReport;
  inputs: Omit<Schemas['FitReportInputsResponseDto'], 'spec'> & { spec: FitSpec };
};

/** The parts and figures the project's fit check uses besides its engine, chassis and transmission. */
export type FitSelections = Schemas['FitSelectionsResponseDto'];

/** What the selections PATCH takes: only the fields to change (a field left out stays as stored, null clears it). */
export type FitSelectionsInput = RequestBodyOf<'/api/projects/{id}/fit-selections', 'patch'>;

export type FitSelectionKey = 'oilPanId' | 'oilPickupId' | 'oilPumpId' | 'controllerId' | 'accessoryDriveId' | 'mountAdapterId';

/** What changed, check by check, between two stored reports (computed on the server). */
export type FitReportComparison = Schemas['FitReportComparisonResponseDto'];
