import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CATALOG_CONTROLLERS } from './catalog.controller';
import { CatalogService } from './catalog.service';
import { CATALOG_ENTITIES } from './catalog-item.entity';

@Module({
  imports: [TypeOrmModule.forFeature(CATALOG_ENTITIES)],
  controllers: CATALOG_CONTROLLERS,
  providers: [CatalogService],
  exports: [CatalogService],
})
export class CatalogModule {}
