import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../common/pagination/page-query.dto';

export const CUSTOMER_SORT_FIELDS = ['name', 'email', 'createdAt', 'updatedAt'] as const;
export type CustomerSortField = (typeof CUSTOMER_SORT_FIELDS)[number];

export class ListCustomersQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: CUSTOMER_SORT_FIELDS, default: 'name' })
  @IsOptional()
  @IsIn(CUSTOMER_SORT_FIELDS, { message: `sort must be one of: ${CUSTOMER_SORT_FIELDS.join(', ')}` })
  sort?: CustomerSortField;
}
