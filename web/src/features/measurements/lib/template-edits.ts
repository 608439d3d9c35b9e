import { MEASUREMENT_KIND_INFO, MEASUREMENT_POINT_KINDS, type MeasurementPointKind } from '@swapwright/shared';
import type { EditableMeasurementPoint, MeasurementPoint } from '../types';

export { MEASUREMENT_POINT_KINDS };

/** A template point as the template route takes it: the response's view, unit and reference are the server's. */
export function toEditablePoint(point: MeasurementPoint): EditableMeasurementPoint {
  return {
    id: point.id,
    kind: point.kind,
    label: point.label,
    howTo: point.howTo,
    catalogValue: point.catalogValue,
    required: point.required,
    ...(point.target !== undefined && { target: point.target }),
    ...(point.atX !== undefined && { atX: point.atX }),
  };
}

/** A stable id for a new point from its label: lower-case words joined by dashes, made unique in the template. */
export function newPointId(label: string, taken: ReadonlySet<string>): string {
  const base =
    label
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'point';
  let id = base;
  for (let n = 2; taken.has(id); n += 1) id = `${base}-${n}`;
  return id;
}

/** What a point of this kind needs besides a label: an obstacle, side or corner (`target`) and/or a station. */
export function kindNeeds(kind: MeasurementPointKind): { target?: 'obstacle' | 'side' | 'corner'; station: boolean } {
  const info = MEASUREMENT_KIND_INFO[kind];
  return { target: info.target, station: Boolean(info.station) };
}

/** The kind in words for the picker. */
export function kindLabel(kind: MeasurementPointKind): string {
  const info = MEASUREMENT_KIND_INFO[kind];
  return `${kind.replace(/-/g, ' ')} (${info.quantity === 'angle' ? 'angle' : info.view === 'front' ? 'across' : 'side view'})`;
}
