import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ProjectsModule } from '../projects/projects.module';
import { MeasurementsModule } from '../measurements/measurements.module';
import { PartsModule } from '../parts/parts.module';
import { WorkOrder, WorkOrderCheck, WorkOrderCheckPhoto } from './work-order.entity';
import { ProjectWorkOrderController, WorkOrderPhotosController, WorkOrdersController } from './work-orders.controller';
import { WorkOrdersService } from './work-orders.service';

@Module({
  imports: [TypeOrmModule.forFeature([WorkOrder, WorkOrderCheck, WorkOrderCheckPhoto]), ProjectsModule, MeasurementsModule, PartsModule],
  controllers: [WorkOrdersController, ProjectWorkOrderController, WorkOrderPhotosController],
  providers: [WorkOrdersService],
  exports: [WorkOrdersService],
})
export class WorkOrdersModule {}
