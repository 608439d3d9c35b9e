import { ApiProperty } from '@nestjs/swagger';
import { CATALOG_KIND_NAMES } from '@swapwright/shared';
import type { CatalogKind } from '../catalog-kinds';

export class SampleCatalogKindCountDto {
  @ApiProperty({ enum: CATALOG_KIND_NAMES }) kind: CatalogKind;
  @ApiProperty({ description: 'Records of this kind in the sample catalog' }) inSample: number;
  @ApiProperty({ description: 'Of those, added to your catalog by this request' }) added: number;
}

export class SampleCatalogResponseDto {
  @ApiProperty({ description: 'Sample records added to your catalog by this request (0 when they were all there already)' })
  added: number;
  @ApiProperty({ description: 'Sample records your catalog already had, left as they are' }) alreadyThere: number;
  @ApiProperty({ type: [SampleCatalogKindCountDto] }) kinds: SampleCatalogKindCountDto[];
  @ApiProperty({ description: 'What happened, in a sentence to show' }) message: string;
}
