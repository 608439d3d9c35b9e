import { ApiPropertyOptional } from '@nestjs/swagger';
import { WORK_ORDER_STATES, type WorkOrderState } from '@swapwright/shared';
import { IsIn, IsOptional } from 'class-validator';

export class ListWorkOrdersQueryDto {
  @ApiPropertyOptional({ enum: WORK_ORDER_STATES })
  @IsOptional()
  @IsIn(WORK_ORDER_STATES, { message: `state must be one of: ${WORK_ORDER_STATES.join(', ')}` })
  state?: WorkOrderState;
}
