import { ApiProperty } from '@nestjs/swagger';

export class CapturedMailResponseDto {
  @ApiProperty() id: number;
  @ApiProperty({ type: [String] }) to: string[];
  @ApiProperty() from: string;
  @ApiProperty() subject: string;
  @ApiProperty() text: string;
  @ApiProperty() html: string;
  @ApiProperty() receivedAt: string;
}
