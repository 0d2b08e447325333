import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CodesModule } from '../codes/codes.module';
import { AddOn } from './entities/addon.entity';
import { ExchangeRate } from './entities/exchange-rate.entity';
import { Outcome } from './entities/outcome.entity';
import { Part } from './entities/part.entity';
import { PossibleCause } from './entities/possible-cause.entity';
import { Teardown } from './entities/teardown.entity';
import { knowledgeConfig } from './knowledge.config';
import { KnowledgeController } from './knowledge.controller';
import { KnowledgeService } from './knowledge.service';
import { LikelihoodService } from './likelihood.service';

/** Possible causes, learned likelihoods and the fix path. Exports its services for jobs and field reports. */
@Module({
  imports: [ConfigModule.forFeature(knowledgeConfig), TypeOrmModule.forFeature([Part, Teardown, PossibleCause, AddOn, Outcome, ExchangeRate]), CodesModule],
  controllers: [KnowledgeController],
  providers: [KnowledgeService, LikelihoodService],
  exports: [KnowledgeService, LikelihoodService, TypeOrmModule],
})
export class KnowledgeModule {}
