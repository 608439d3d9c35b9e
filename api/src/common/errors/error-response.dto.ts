import { ApiProperty } from '@nestjs/swagger';

export class ErrorResponseDto {
  @ApiProperty({ example: 400 }) statusCode: number;
  @ApiProperty({ example: 'Bad Request' }) error: string;
  @ApiProperty({ example: 'validation_failed' }) code: string;
  @ApiProperty({ example: 'name must be shorter than or equal to 120 characters' }) message: string;
  @ApiProperty({ type: [String] }) details: string[];
  @ApiProperty({ example: '6f1c0d3e-2a8b-4c5d-9e0f-1a2b3c4d5e6f' }) correlationId: string;
}
