import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { MEASUREMENT_POINT_KINDS, type MeasurementPointKind } from '@swapwright/shared';

export class MeasurementPointResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ enum: MEASUREMENT_POINT_KINDS }) kind: MeasurementPointKind;
  @ApiProperty() label: string;
  @ApiProperty() howTo: string;
  @ApiPropertyOptional() target?: string;
  @ApiPropertyOptional() atX?: number;
  @ApiProperty({ type: Number, nullable: true }) catalogValue: number | null;
  @ApiProperty() required: boolean;
  @ApiProperty({ enum: ['side', 'front'] }) view: 'side' | 'front';
  @ApiProperty({ enum: ['mm', 'deg'] }) unit: 'mm' | 'deg';
  @ApiProperty({ description: 'How the reading is taken (floor, front-axle-behind, front-axle-ahead, across, level).' }) reference: string;
}

export class MeasurementTemplateResponseDto {
  @ApiProperty() chassisId: string;
  @ApiProperty({ type: [MeasurementPointResponseDto] }) points: MeasurementPointResponseDto[];
}

export class MeasurementValueResponseDto {
  @ApiProperty() pointId: string;
  @ApiProperty({ description: 'mm, or degrees for an angle' }) value: number;
  @ApiProperty({ type: Number, nullable: true }) tolerance: number | null;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
  @ApiProperty() measuredBy: string;
  @ApiProperty() measuredAt: string;
  @ApiProperty({ description: "1 for the point's first reading, one more on every change; a save sends it back as `seenVersion`." }) version: number;
  @ApiProperty({ type: Number, nullable: true, description: 'Reading minus what the catalog predicts on this truck.' }) deviation: number | null;
  @ApiProperty() flagged: boolean;
}

export class MeasurementEventResponseDto {
  @ApiProperty({ enum: ['value', 'sign-off'] }) kind: 'value' | 'sign-off';
  @ApiProperty({ type: String, nullable: true }) pointId: string | null;
  @ApiProperty({ type: Number, nullable: true }) oldValue: number | null;
  @ApiProperty({ type: Number, nullable: true }) newValue: number | null;
  @ApiProperty({ type: String, nullable: true }) reason: string | null;
  @ApiProperty() by: string;
  @ApiProperty() at: string;
}

export class MeasurementPhotoResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ type: String, nullable: true }) pointId: string | null;
  @ApiProperty({ enum: ['image/jpeg', 'image/png', 'image/webp'] }) contentType: string;
  @ApiProperty() bytes: number;
  @ApiProperty() widthPx: number;
  @ApiProperty() heightPx: number;
  @ApiProperty({ enum: ['accepted', 'pending'] }) status: 'accepted' | 'pending';
  @ApiProperty() uploadedBy: string;
  @ApiProperty() uploadedById: string;
  @ApiProperty() createdAt: string;
  @ApiProperty({ description: 'GET this path (with the bearer token) for the file.' }) url: string;
}

export class MeasurementGroundResponseDto {
  @ApiProperty() zAtFrontAxleMm: number;
  @ApiProperty() zAtRearAxleMm: number;
  @ApiProperty() pitchDeg: number;
}

export class MeasurementSheetResponseDto {
  @ApiProperty() projectId: string;
  @ApiProperty({ type: String, nullable: true }) chassisId: string | null;
  @ApiProperty({ type: String, nullable: true }) signedOffAt: string | null;
  @ApiProperty({ type: [MeasurementPointResponseDto] }) points: MeasurementPointResponseDto[];
  @ApiProperty({ type: [MeasurementValueResponseDto] }) values: MeasurementValueResponseDto[];
  @ApiProperty({ type: [String], description: 'Required points still without a value.' }) missing: string[];
  @ApiProperty({ type: [MeasurementPhotoResponseDto] }) photos: MeasurementPhotoResponseDto[];
  @ApiProperty({ type: [MeasurementEventResponseDto] }) history: MeasurementEventResponseDto[];
  @ApiProperty({ type: MeasurementGroundResponseDto, nullable: true }) ground: MeasurementGroundResponseDto | null;
}

export class MeasurementSettingsResponseDto {
  @ApiProperty() deviationLimitMm: number;
  @ApiProperty() deviationLimitDeg: number;
}
