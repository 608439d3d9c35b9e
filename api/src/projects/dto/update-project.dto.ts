import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsOptional, ValidateNested } from 'class-validator';
import { CreateProjectDto, UpdateProjectGoalsDto } from './create-project.dto';

export class UpdateProjectDto extends PartialType(OmitType(CreateProjectDto, ['goals', 'forMyself'] as const)) {
  @ApiPropertyOptional({ type: UpdateProjectGoalsDto, description: 'Only the given goal fields change' })
  @IsOptional()
  @ValidateNested()
  @Type(() => UpdateProjectGoalsDto)
  goals?: UpdateProjectGoalsDto;
}
