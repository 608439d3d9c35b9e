import { FitReportComparisonResponseDto, FitReportResponseDto, FitReportSummaryResponseDto } from './dto/fit-report-response.dto';
import { FitReportRecord } from './fit-report-record.entity';
import type { FitReportComparison } from './fit-reports.service';

export function mapFitReportSummary(record: FitReportRecord): FitReportSummaryResponseDto {
  return {
    id: record.id,
    projectId: record.projectId,
    createdById: record.createdById,
    createdByName: record.createdBy?.name ?? null,
    engineVersion: record.engineVersion,
    placement: { setbackMm: record.placementSetbackMm, heightMm: record.placementHeightMm, tiltDeg: record.placementTiltDeg },
    placementSource: record.placementSource,
    counts: {
      total: record.totalCount,
      ok: record.okCount,
      tight: record.tightCount,
      fails: record.failsCount,
      unknown: record.unknownCount,
    },
    worstStatus: record.worstStatus,
    caution: record.results.caution,
    createdAt: record.createdAt.toISOString(),
  };
}

export function mapFitReport(record: FitReportRecord): FitReportResponseDto {
  return {
    ...mapFitReportSummary(record),
    report: record.results as unknown as FitReportResponseDto['report'],
    inputs: record.inputsSnapshot as unknown as FitReportResponseDto['inputs'],
  };
}

export function mapFitReportComparison(comparison: FitReportComparison): FitReportComparisonResponseDto {
  return { a: mapFitReportSummary(comparison.a), b: mapFitReportSummary(comparison.b), changes: comparison.changes };
}
