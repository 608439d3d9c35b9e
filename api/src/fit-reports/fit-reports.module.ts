import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogModule } from '../catalog/catalog.module';
import { MeasurementsModule } from '../measurements/measurements.module';
import { ProjectsModule } from '../projects/projects.module';
import { FitReportRecord } from './fit-report-record.entity';
import { FitReportsController, ProjectFitReportsController } from './fit-reports.controller';
import { FitReportsService } from './fit-reports.service';
import { FitSelectionsController } from './fit-selections.controller';
import { FitSelectionsService } from './fit-selections.service';
import { FitSettingsController } from './fit-settings.controller';
import { FitSettingsService } from './fit-settings.service';
import { FitSpecBuilderService } from './fit-spec-builder.service';
import { ProjectFitSelection } from './project-fit-selection.entity';
import { ShopFitSettings } from './shop-fit-settings.entity';

@Module({
  imports: [TypeOrmModule.forFeature([FitReportRecord, ProjectFitSelection, ShopFitSettings]), CatalogModule, ProjectsModule, MeasurementsModule],
  controllers: [ProjectFitReportsController, FitReportsController, FitSelectionsController, FitSettingsController],
  providers: [FitReportsService, FitSelectionsService, FitSettingsService, FitSpecBuilderService],
  exports: [FitReportsService, FitSpecBuilderService, FitSettingsService],
})
export class FitReportsModule {}
