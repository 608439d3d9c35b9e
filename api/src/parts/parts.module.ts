import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ShopsModule } from '../shops/shops.module';
import { CatalogModule } from '../catalog/catalog.module';
import { FitReportsModule } from '../fit-reports/fit-reports.module';
import { ProjectsModule } from '../projects/projects.module';
import { CounterService } from './counter.service';
import { MipSolverService } from './mip-solver.service';
import { PARTS_ENTITIES } from './part.entity';
import { PartsController, SuppliersController } from './parts.controller';
import { PartsImportService } from './parts-import.service';
import { PartsPlansController } from './parts-plans.controller';
import { PartsPlansService } from './parts-plans.service';
import { PartsService } from './parts.service';

@Module({
  imports: [TypeOrmModule.forFeature(PARTS_ENTITIES), CatalogModule, ProjectsModule, FitReportsModule, ShopsModule],
  controllers: [PartsController, SuppliersController, PartsPlansController],
  providers: [PartsService, PartsImportService, PartsPlansService, CounterService, MipSolverService],
  exports: [PartsPlansService, MipSolverService, CounterService],
})
export class PartsModule {}
