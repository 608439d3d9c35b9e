import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsUUID } from 'class-validator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';
import { PROJECT_STATUSES, ProjectStatus } from '../project.entity';

export const PROJECT_SORT_FIELDS = ['title', 'status', 'createdAt', 'updatedAt'] as const;
export type ProjectSortField = (typeof PROJECT_SORT_FIELDS)[number];

export class ListProjectsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: PROJECT_SORT_FIELDS, default: 'updatedAt' })
  @IsOptional()
  @IsIn(PROJECT_SORT_FIELDS, { message: `sort must be one of: ${PROJECT_SORT_FIELDS.join(', ')}` })
  sort?: ProjectSortField;

  @ApiPropertyOptional({ enum: PROJECT_STATUSES })
  @IsOptional()
  @IsIn(PROJECT_STATUSES, { message: `status must be one of: ${PROJECT_STATUSES.join(', ')}` })
  status?: ProjectStatus;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a UUID' })
  customerId?: string;
}
