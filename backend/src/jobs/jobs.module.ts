import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CodesModule } from '../codes/codes.module';
import { EstimateAnswer } from '../estimates/entities/estimate-answer.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { KnowledgeModule } from '../knowledge/knowledge.module';
import { User } from '../users/entities/user.entity';
import { VehiclesModule } from '../vehicles/vehicles.module';
import { JobCode } from './entities/job-code.entity';
import { JobStep } from './entities/job-step.entity';
import { Job } from './entities/job.entity';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';

@Module({
  imports: [TypeOrmModule.forFeature([Job, JobCode, JobStep, User, Estimate, EstimateAnswer]), VehiclesModule, KnowledgeModule, CodesModule],
  controllers: [JobsController],
  providers: [JobsService],
  exports: [JobsService],
})
export class JobsModule {}
