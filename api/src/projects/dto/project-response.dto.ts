import { ApiProperty } from '@nestjs/swagger';
import { PROJECT_STATUSES, PROJECT_USES, ProjectStatus, ProjectUse } from '../project.entity';

export class ProjectCustomerRefDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
}

export class ProjectGoalsResponseDto {
  @ApiProperty({ enum: PROJECT_USES }) use: ProjectUse;
  @ApiProperty({ type: Number, nullable: true }) targetPowerKw: number | null;
  @ApiProperty({ type: Number, nullable: true }) revLimitRpm: number | null;
  @ApiProperty({ type: Number, nullable: true }) budgetCents: number | null;
}

export class ProjectPlacementResponseDto {
  @ApiProperty() setbackMm: number;
  @ApiProperty() heightMm: number;
  @ApiProperty() tiltDeg: number;
}

export class ProjectResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() title: string;
  @ApiProperty({ enum: PROJECT_STATUSES }) status: ProjectStatus;
  @ApiProperty({ format: 'uuid' }) customerId: string;
  @ApiProperty({ type: ProjectCustomerRefDto }) customer: ProjectCustomerRefDto;
  @ApiProperty({
    description: "True when the project is the signed-in member's own vehicle (filed under their own customer record): its quotes are the builder's budget, with nobody to send them to",
  })
  forMyself: boolean;
  @ApiProperty() vehicleDescription: string;
  @ApiProperty({ type: String, nullable: true }) chassisModelId: string | null;
  @ApiProperty({ type: String, nullable: true }) engineProfileId: string | null;
  @ApiProperty({ type: String, nullable: true }) transmissionId: string | null;
  @ApiProperty({ type: ProjectGoalsResponseDto }) goals: ProjectGoalsResponseDto;
  @ApiProperty({ type: ProjectPlacementResponseDto, nullable: true }) placement: ProjectPlacementResponseDto | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

