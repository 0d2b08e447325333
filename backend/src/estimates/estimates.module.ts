import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { JobsModule } from '../jobs/jobs.module';
import { MailModule } from '../mail/mail.module';
import { Shop } from '../shops/entities/shop.entity';
import { EstimateAnswer } from './entities/estimate-answer.entity';
import { Estimate } from './entities/estimate.entity';
import { EstimatesController, PublicEstimatesController } from './estimates.controller';
import { estimatesConfig } from './estimates.config';
import { EstimatesService } from './estimates.service';

@Module({
  imports: [ConfigModule.forFeature(estimatesConfig), TypeOrmModule.forFeature([Estimate, EstimateAnswer, Shop]), JobsModule, MailModule],
  controllers: [EstimatesController, PublicEstimatesController],
  providers: [EstimatesService],
})
export class EstimatesModule {}
