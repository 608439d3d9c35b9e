import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';
import { PageMetaResponseDto } from '../../common/pagination/page-response';
import { JOB_KINDS, JOB_STATES, type JobKind, type JobState } from '../job-kinds';

export class ListJobsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: JOB_STATES, description: 'Only jobs in this state' })
  @IsOptional()
  @IsIn(JOB_STATES, { message: `state must be one of: ${JOB_STATES.join(', ')}` })
  state?: JobState;
}

export class JobResponseDto {
  @ApiProperty() id: string;
  @ApiProperty({ enum: JOB_KINDS }) kind: JobKind;
  @ApiProperty({ description: 'What the work is about, e.g. "Quote Q-0003 (revision 1) e-mail to …"' }) subject: string;
  @ApiProperty({ enum: JOB_STATES }) state: JobState;
  @ApiProperty({ description: 'Attempts made so far (counted from zero again when a stopped job is tried again)' }) attempts: number;
  @ApiProperty() maxAttempts: number;
  @ApiProperty({ type: String, nullable: true, description: 'Why the last attempt failed, in words to act on' }) lastError: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'The technical reason of the last failure, as reported (for whoever runs the server)' })
  lastErrorDetail: string | null;
  @ApiProperty({ format: 'date-time', description: 'When it is (or was) due' }) runAt: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time', description: 'Its last change (claimed, failed, done or tried again)' }) updatedAt: string;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) doneAt: string | null;
}

export class JobCountsDto {
  @ApiProperty() queued: number;
  @ApiProperty() running: number;
  @ApiProperty() done: number;
  @ApiProperty() dead: number;
}

/** The page schema of every list, plus the shop's counts by state. */
export class JobPageResponseDto extends PageMetaResponseDto {
  @ApiProperty({ type: [JobResponseDto] }) items: JobResponseDto[];
  @ApiProperty({ type: JobCountsDto, description: "The shop's jobs by state" }) counts: JobCountsDto;
}
