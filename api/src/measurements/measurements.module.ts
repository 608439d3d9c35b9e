import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogModule } from '../catalog/catalog.module';
import { ProjectsModule } from '../projects/projects.module';
import { MEASUREMENT_ENTITIES } from './measurement-sheet.entity';
import { MeasurementsController } from './measurements.controller';
import { MeasurementsService } from './measurements.service';
import { PhotoIntakeService } from './photo-intake.service';
import { LocalDiskPhotoStorage, PhotoStorage } from './photo-storage';
import { S3PhotoStorage } from './s3-photo-storage';
import { ConfigService } from '@nestjs/config';
import { AppConfigService } from '../config/app-config';

/** The photo storage driver chosen by STORAGE_DRIVER. */
export function photoStorageFor(config: AppConfigService): PhotoStorage {
  if (config.get('STORAGE_DRIVER', { infer: true }) !== 's3') return new LocalDiskPhotoStorage(config);
  return new S3PhotoStorage({
    bucket: config.get('S3_BUCKET', { infer: true })!,
    region: config.get('S3_REGION', { infer: true }) || 'us-east-1',
    endpoint: config.get('S3_ENDPOINT', { infer: true }) || undefined,
    accessKeyId: config.get('S3_ACCESS_KEY_ID', { infer: true }),
    secretAccessKey: config.get('S3_SECRET_ACCESS_KEY', { infer: true }),
  });
}

@Module({
  imports: [TypeOrmModule.forFeature(MEASUREMENT_ENTITIES), CatalogModule, ProjectsModule],
  controllers: [MeasurementsController],
  providers: [
    MeasurementsService,
    PhotoIntakeService,
    {
      provide: PhotoStorage,
      inject: [ConfigService],
      useFactory: photoStorageFor,
    },
  ],
  exports: [MeasurementsService, PhotoStorage, PhotoIntakeService],
})
export class MeasurementsModule {}
