import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CodesModule } from '../codes/codes.module';
import { JobCode } from '../jobs/entities/job-code.entity';
import { JobStep } from '../jobs/entities/job-step.entity';
import { Job } from '../jobs/entities/job.entity';
import { Part } from '../knowledge/entities/part.entity';
import { Shop } from '../shops/entities/shop.entity';
import { InsightsController } from './insights.controller';
import { InsightsService } from './insights.service';

@Module({
  imports: [TypeOrmModule.forFeature([Job, JobCode, JobStep, Part, Shop]), CodesModule],
  controllers: [InsightsController],
  providers: [InsightsService],
})
export class InsightsModule {}
