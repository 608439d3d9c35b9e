import { ApiProperty } from '@nestjs/swagger';
import { IsUUID } from 'class-validator';

export class CompareFitReportsQueryDto {
  @ApiProperty({ format: 'uuid', description: 'The earlier report' })
  @IsUUID('all', { message: 'a must be a UUID' })
  a: string;

  @ApiProperty({ format: 'uuid', description: 'The report compared against a' })
  @IsUUID('all', { message: 'b must be a UUID' })
  b: string;
}
