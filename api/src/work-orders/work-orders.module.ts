import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ProjectsModule } from '../projects/projects.module';
import { WorkOrder, WorkOrderCheck } from './work-order.entity';
import { ProjectWorkOrderController, WorkOrdersController } from './work-orders.controller';
import { WorkOrdersService } from './work-orders.service';

@Module({
  imports: [TypeOrmModule.forFeature([WorkOrder, WorkOrderCheck]), ProjectsModule],
  controllers: [WorkOrdersController, ProjectWorkOrderController],
  providers: [WorkOrdersService],
  exports: [WorkOrdersService],
})
export class WorkOrdersModule {}
