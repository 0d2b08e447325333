import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuditEntryDto, Page } from '@causeway/shared';
import { Roles } from '../common/decorators/roles.decorator';
import { AuditService } from './audit.service';
import { AuditQuery } from './dto/audit-query.dto';

@ApiTags('audit')
@ApiBearerAuth()
@Roles('admin')
@Controller('admin/audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  /** Newest first; filter by actor, action, entity type and time. */
  @Get()
  browse(@Query() query: AuditQuery): Promise<Page<AuditEntryDto>> {
    return this.audit.browse(query);
  }
}
