import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { JobHandlers } from './job-handlers';
import { Job } from './job.entity';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';
import { JobsWorker } from './jobs.worker';

/** Global: modules enqueue their background work through JobsService and register its handlers with JobHandlers. */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([Job])],
  controllers: [JobsController],
  providers: [JobsService, JobHandlers, JobsWorker],
  exports: [JobsService, JobHandlers],
})
export class JobsModule {}
