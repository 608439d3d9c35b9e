import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { AUDIT_KINDS, type AuditKind } from '@swapwright/shared';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';

export class ListAuditEventsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: AUDIT_KINDS, description: 'Only events of this kind' })
  @IsOptional()
  @IsIn(AUDIT_KINDS)
  kind?: AuditKind;
}

export class AuditEventResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ enum: AUDIT_KINDS }) kind: AuditKind;
  @ApiProperty({ description: 'What happened, e.g. quote.sent, stock.reserved, membership.role-changed' }) action: string;
  @ApiProperty({ type: String, nullable: true, description: 'The member who made the change; null for the payment provider or a customer link' })
  actorUserId: string | null;
  @ApiProperty() actorName: string;
  @ApiProperty({ type: String, nullable: true, description: 'The record changed' }) subjectId: string | null;
  @ApiProperty() summary: string;
  @ApiProperty({ type: 'object', additionalProperties: true, nullable: true, description: 'The changed fields before' })
  before: Record<string, unknown> | null;
  @ApiProperty({ type: 'object', additionalProperties: true, nullable: true, description: 'The changed fields after' })
  after: Record<string, unknown> | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}
