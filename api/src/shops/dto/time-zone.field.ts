import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, IsTimeZone, MaxLength } from 'class-validator';
import { Trim } from '../../common/decorators/trim.decorator';

export const TIME_ZONE_MESSAGE =
  'timeZone must be an IANA time zone name such as America/Denver, Europe/Berlin or UTC (Region/City, as your computer lists it)';

/** An optional IANA time zone name ("America/Denver"): the shop's calendar day, by which its quotes are dated. */
export function TimeZoneField(description: string): PropertyDecorator {
  return applyDecorators(
    ApiPropertyOptional({ example: 'America/Denver', maxLength: 64, description }),
    IsOptional(),
    Trim(),
    IsString({ message: TIME_ZONE_MESSAGE }),
    MaxLength(64, { message: TIME_ZONE_MESSAGE }),
    IsTimeZone({ message: TIME_ZONE_MESSAGE }),
  );
}
