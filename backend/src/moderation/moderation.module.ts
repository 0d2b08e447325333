import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { CodesModule } from '../codes/codes.module';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { SafetyCaution } from '../codes/entities/safety-caution.entity';
import { Part } from '../knowledge/entities/part.entity';
import { PossibleCause } from '../knowledge/entities/possible-cause.entity';
import { Teardown } from '../knowledge/entities/teardown.entity';
import { KnowledgeEditsService } from './knowledge-edits.service';
import { ModerationController } from './moderation.controller';

/** Moderators' direct edits of codes, parts, teardowns and possible causes, each audited. */
@Module({
  imports: [TypeOrmModule.forFeature([DtcCode, SafetyCaution, Part, Teardown, PossibleCause]), AuditModule, CodesModule],
  controllers: [ModerationController],
  providers: [KnowledgeEditsService],
  exports: [KnowledgeEditsService],
})
export class ModerationModule {}
