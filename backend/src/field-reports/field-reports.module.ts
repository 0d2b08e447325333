import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { CodesModule } from '../codes/codes.module';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { KnowledgeModule } from '../knowledge/knowledge.module';
import { MailModule } from '../mail/mail.module';
import { ModerationModule } from '../moderation/moderation.module';
import { Attachment } from '../uploads/entities/attachment.entity';
import { UploadsModule } from '../uploads/uploads.module';
import { User } from '../users/entities/user.entity';
import { FieldReport } from './entities/field-report.entity';
import { FieldReportsController } from './field-reports.controller';
import { FieldReportsService } from './field-reports.service';
import { ReviewDiffService } from './review-diff.service';
import { ReviewController } from './review.controller';
import { ReviewService } from './review.service';

/**
 * Field reports, their evidence and the review desk. Brings in the moderators' direct edits
 * (`/api/knowledge/...`) and the audit log (`/api/admin/audit`), which approvals write through.
 */
@Module({
  imports: [TypeOrmModule.forFeature([FieldReport, Attachment, User, DtcCode]), AuditModule, ModerationModule, UploadsModule, KnowledgeModule, CodesModule, MailModule],
  controllers: [FieldReportsController, ReviewController],
  providers: [FieldReportsService, ReviewService, ReviewDiffService],
  exports: [FieldReportsService],
})
export class FieldReportsModule {}
