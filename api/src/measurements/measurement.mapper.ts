import { MEASUREMENT_KIND_INFO, measurementUnit, missingPoints, type MeasurementPoint } from '@swapwright/shared';
import { MeasurementPhotoResponseDto, MeasurementPointResponseDto, MeasurementSheetResponseDto } from './dto/measurement-response.dto';
import { MeasurementPhoto } from './measurement-sheet.entity';
import { SheetView } from './measurements.service';

export function mapMeasurementPoint(point: MeasurementPoint): MeasurementPointResponseDto {
  const info = MEASUREMENT_KIND_INFO[point.kind];
  return { ...point, view: info.view, unit: measurementUnit(point.kind), reference: info.reference };
}

export function mapMeasurementPhoto(photo: MeasurementPhoto): MeasurementPhotoResponseDto {
  return {
    id: photo.id,
    pointId: photo.pointId,
    contentType: photo.contentType,
    bytes: photo.bytes,
    widthPx: photo.widthPx,
    heightPx: photo.heightPx,
    status: photo.status,
    uploadedBy: photo.uploadedByName,
    uploadedById: photo.uploadedById,
    createdAt: photo.createdAt.toISOString(),
    url: `/api/measurement-photos/${photo.id}/file`,
  };
}

export function mapMeasurementSheet(view: SheetView): MeasurementSheetResponseDto {
  const inputs = new Map((view.applied?.inputs ?? []).map((i) => [i.pointId, i]));
  return {
    projectId: view.project.id,
    chassisId: view.project.chassisModelId,
    signedOffAt: view.sheet?.signedOffAt?.toISOString() ?? null,
    points: view.points.map(mapMeasurementPoint),
    values: view.values.map((v) => ({
      pointId: v.pointId,
      value: v.value,
      tolerance: v.tolerance,
      note: v.note,
      measuredBy: v.measuredByName,
      measuredAt: v.measuredAt.toISOString(),
      version: v.version,
      deviation: inputs.get(v.pointId)?.deviation ?? null,
      flagged: inputs.get(v.pointId)?.flagged ?? false,
    })),
    missing: missingPoints(view.points, new Set(view.values.map((v) => v.pointId))).map((p) => p.id),
    photos: view.photos.map(mapMeasurementPhoto),
    history: view.events.map((e) => ({ kind: e.kind, pointId: e.pointId, oldValue: e.oldValue, newValue: e.newValue, reason: e.reason, by: e.byName, at: e.at.toISOString() })),
    ground: view.applied?.ground ?? null,
  };
}
