import { counterReadiness, WORK_ORDER_DEFERENCE, workOrderCautions } from '@swapwright/shared';
import type { CounterLine } from '../parts/part.entity';
import type { Project } from '../projects/project.entity';
import { RecordedCheckResponseDto, WorkCheckPhotoResponseDto, WorkOrderResponseDto, WorkOrderSummaryResponseDto, WorkPartsAtCounterResponseDto, WorkProgressResponseDto } from './dto/work-order-response.dto';
import { WorkOrder, WorkOrderCheck, WorkOrderCheckPhoto } from './work-order.entity';

export function workOrderLabel(order: Pick<WorkOrder, 'number'>): string {
  return `W-${String(order.number).padStart(4, '0')}`;
}

/** The newest recording of each check (records come oldest first). */
export function latestByCheck(records: readonly WorkOrderCheck[]): Map<string, WorkOrderCheck> {
  const latest = new Map<string, WorkOrderCheck>();
  for (const record of records) latest.set(record.checkKey, record);
  return latest;
}

export function progressOf(order: WorkOrder, records: readonly WorkOrderCheck[]): WorkProgressResponseDto {
  const latest = latestByCheck(records);
  const keys = order.steps.flatMap((step) => step.checks.map((check) => check.key));
  const passed = keys.filter((key) => latest.get(key)?.result === 'pass').length;
  const failed = keys.filter((key) => latest.get(key)?.result === 'fail').length;
  return { total: keys.length, passed, failed, open: keys.length - passed - failed };
}

function mapRecord(record: WorkOrderCheck): RecordedCheckResponseDto {
  return {
    id: record.id,
    result: record.result,
    value: record.value,
    note: record.note,
    recordedByName: record.recordedByName,
    recordedAt: record.recordedAt.toISOString(),
  };
}

function mapCheckPhoto(photo: WorkOrderCheckPhoto): WorkCheckPhotoResponseDto {
  const { id, contentType, widthPx, heightPx, bytes, uploadedByName } = photo;
  return { id, contentType, widthPx, heightPx, bytes, uploadedByName, createdAt: photo.createdAt.toISOString() };
}

export function mapWorkOrderSummary(order: WorkOrder, project: Project, records: readonly WorkOrderCheck[]): WorkOrderSummaryResponseDto {
  return {
    id: order.id,
    label: workOrderLabel(order),
    state: order.state,
    projectId: order.projectId,
    projectTitle: project.title,
    customerName: project.customer?.name ?? null,
    createdAt: order.createdAt.toISOString(),
    progress: progressOf(order, records),
  };
}

export function mapWorkOrder(
  order: WorkOrder,
  project: Project,
  records: readonly WorkOrderCheck[],
  photos: readonly WorkOrderCheckPhoto[],
  counterLines: { planId: string; lines: readonly CounterLine[] } | null,
): WorkOrderResponseDto {
  const latest = latestByCheck(records);
  const counts = new Map<string, number>();
  for (const record of records) counts.set(record.checkKey, (counts.get(record.checkKey) ?? 0) + 1);
  return {
    ...mapWorkOrderSummary(order, project, records),
    vehicleDescription: project.vehicleDescription,
    quoteId: order.quoteId,
    quoteLabel: `Q-${String(order.number).padStart(4, '0')}`,
    quoteRevision: order.quoteRevision,
    fitReportId: order.fitReportId,
    partsPlanVersion: order.partsPlanVersion,
    startedAt: order.startedAt?.toISOString() ?? null,
    finishedAt: order.finishedAt?.toISOString() ?? null,
    steps: order.steps.map((step) => ({
      ...step,
      // Work orders opened before joints were named carry none.
      torque: step.torque.map((spec) => ({ ...spec, joint: spec.joint ?? null })),
      checks: step.checks.map((check) => {
        const record = latest.get(check.key);
        return {
          ...check,
          // Work orders opened before plan resolutions were kept carry none.
          fitFinding: check.fitFinding ? { ...check.fitFinding, resolvedBy: check.fitFinding.resolvedBy ?? null } : null,
          latest: record ? mapRecord(record) : null,
          recordings: counts.get(check.key) ?? 0,
          photos: photos.filter((photo) => photo.checkKey === check.key).map(mapCheckPhoto),
        };
      }),
    })),
    cautions: workOrderCautions(order.steps.flatMap((step) => step.hazards)),
    deference: WORK_ORDER_DEFERENCE,
    partsAtCounter: counterLines ? mapPartsAtCounter(counterLines.planId, counterLines.lines) : null,
  };
}

function mapPartsAtCounter(planId: string, lines: readonly CounterLine[]): WorkPartsAtCounterResponseDto {
  const { total, withTheJob, waiting } = counterReadiness(lines);
  return { planId, total, withTheJob, waiting: waiting.map(({ sku, description, quantity, status }) => ({ sku, description, quantity, status })) };
}
