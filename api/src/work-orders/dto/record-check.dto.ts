import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsNotEmpty, IsNumber, IsString, Max, MaxLength, Min } from 'class-validator';
import { IsOptionalDefined } from '../../common/decorators/optional-defined.decorator';
import { Trim } from '../../common/decorators/trim.decorator';

/** One recording of a check: a measured check takes `value` (judged against its range), a confirmation takes `passed`. */
export class RecordCheckDto {
  @ApiProperty({ maxLength: 130, example: 'oil-pan-pickup.screen-height' })
  @IsString()
  @IsNotEmpty({ message: 'checkKey must name one of the work order\'s checks' })
  @MaxLength(130)
  checkKey: string;

  @ApiPropertyOptional({ description: 'Measured checks: the value read, in the check\'s unit', minimum: -100000, maximum: 100000 })
  @IsOptionalDefined()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'value must be a number in the check\'s unit' })
  @Min(-100000)
  @Max(100000)
  value?: number;

  @ApiPropertyOptional({ description: 'Confirmations: true when done as described, false when not' })
  @IsOptionalDefined()
  @IsBoolean({ message: 'passed must be true or false' })
  passed?: boolean;

  @ApiPropertyOptional({ maxLength: 500 })
  @IsOptionalDefined()
  @Trim()
  @IsString()
  @MaxLength(500)
  note?: string;
}
