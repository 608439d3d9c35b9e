import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LaborOperation } from './labor-operation.entity';
import { LaborOperationsController } from './labor-operations.controller';
import { LaborOperationsService } from './labor-operations.service';

@Module({
  imports: [TypeOrmModule.forFeature([LaborOperation])],
  controllers: [LaborOperationsController],
  providers: [LaborOperationsService],
  exports: [LaborOperationsService],
})
export class LaborOperationsModule {}
