import type { RequestBodyOf, Schemas } from '@/lib/api-types';

/** A project's measurement sheet as the API answers it. */
export type MeasurementSheet = Schemas['MeasurementSheetResponseDto'];
export type MeasurementPoint = Schemas['MeasurementPointResponseDto'];
export type MeasurementValue = Schemas['MeasurementValueResponseDto'];
export type MeasurementEvent = Schemas['MeasurementEventResponseDto'];
export type MeasurementPhoto = Schemas['MeasurementPhotoResponseDto'];
export type MeasurementTemplate = Schemas['MeasurementTemplateResponseDto'];
/** A template point as the template route takes it. */
export type EditableMeasurementPoint = Schemas['MeasurementPointDto'];
export type MeasurementSettings = Schemas['MeasurementSettingsResponseDto'];
export type MeasurementSettingsBody = RequestBodyOf<'/api/measurement-settings', 'put'>;
export type SetMeasurementValueBody = RequestBodyOf<'/api/projects/{id}/measurement-sheet/values/{pointId}', 'put'>;
export type MeasurementTemplateBody = RequestBodyOf<'/api/chassis/{chassisId}/measurement-template', 'put'>;
/** One fit-check input governed by a measurement point, with where its value came from (stored with each report). */
export type ChassisInput = Schemas['ChassisInputDto'];
