import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CATALOG_CONTROLLERS } from './catalog.controller';
import { CatalogService } from './catalog.service';
import { CATALOG_ENTITIES } from './catalog-item.entity';
import { SampleCatalogController } from './sample-catalog.controller';
import { SampleCatalogService } from './sample-catalog.service';

@Module({
  imports: [TypeOrmModule.forFeature(CATALOG_ENTITIES)],
  controllers: [SampleCatalogController, ...CATALOG_CONTROLLERS],
  providers: [CatalogService, SampleCatalogService],
  exports: [CatalogService],
})
export class CatalogModule {}
