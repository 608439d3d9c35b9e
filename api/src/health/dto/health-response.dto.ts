import { ApiProperty } from '@nestjs/swagger';

export class HealthResponseDto {
  @ApiProperty({ example: 'ok' }) status: 'ok';
  @ApiProperty({ example: 'up' }) database: 'up';
}
