import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogModule } from '../catalog/catalog.module';
import { ProjectsModule } from '../projects/projects.module';
import { MEASUREMENT_ENTITIES } from './measurement-sheet.entity';
import { MeasurementsController } from './measurements.controller';
import { MeasurementsService } from './measurements.service';
import { LocalDiskPhotoStorage, PhotoStorage } from './photo-storage';

@Module({
  imports: [TypeOrmModule.forFeature(MEASUREMENT_ENTITIES), CatalogModule, ProjectsModule],
  controllers: [MeasurementsController],
  providers: [MeasurementsService, { provide: PhotoStorage, useClass: LocalDiskPhotoStorage }],
  exports: [MeasurementsService, PhotoStorage],
})
export class MeasurementsModule {}
