import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query, Res, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ATTACHMENT_LIMITS, type AttachmentDto, type FieldReportDto, type FieldReportSummaryDto, type Page } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UploadErrorsInterceptor } from '../uploads/upload-errors.interceptor';
import { FieldReportBody, MyReportsQuery } from './dto/field-report.dto';
import { FieldReportsService } from './field-reports.service';

/**
 * Field reports of the signed-in contributor (contributors and up; technicians cannot file).
 * Moderators may also read submitted reports and their attachments here.
 */
@ApiTags('field reports')
@ApiBearerAuth()
@Roles('contributor')
@Controller('field-reports')
export class FieldReportsController {
  constructor(private readonly reports: FieldReportsService) {}

  /** Saves a draft, or submits at once with `submit: true`. */
  @Post()
  create(@CurrentUser() user: AuthUser, @Body() body: FieldReportBody): Promise<FieldReportDto> {
    return this.reports.create(user, body);
  }

  /** The caller's own reports with their status, most recently changed first. */
  @Get()
  mine(@CurrentUser() user: AuthUser, @Query() query: MyReportsQuery): Promise<Page<FieldReportSummaryDto>> {
    return this.reports.mine(user, query);
  }

  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<FieldReportDto> {
    return this.reports.get(user, id);
  }

  /** Replaces a draft's kind and payload (drafts only). */
  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() body: FieldReportBody): Promise<FieldReportDto> {
    return this.reports.update(user, id, body);
  }

  @Post(':id/submit')
  @HttpCode(200)
  submit(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<FieldReportDto> {
    return this.reports.submit(user, id);
  }

  @Post(':id/withdraw')
  @HttpCode(200)
  withdraw(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<FieldReportDto> {
    return this.reports.withdraw(user, id);
  }

  /** Photos (JPEG, PNG, WebP; re-encoded without metadata) and PDF invoices, to a draft. All or nothing. */
  @Post(':id/attachments')
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { files: { type: 'array', items: { type: 'string', format: 'binary' } } } } })
  @UseInterceptors(
    UploadErrorsInterceptor,
    FilesInterceptor('files', undefined, {
      // Keep the sent name whole, so a name with a path is seen and refused rather than silently cut.
      preservePath: true,
      limits: { fileSize: ATTACHMENT_LIMITS.maxBytes, files: ATTACHMENT_LIMITS.maxFiles, fields: 10, parts: ATTACHMENT_LIMITS.maxFiles + 10, fieldSize: 1024 },
    }),
  )
  addAttachments(@CurrentUser() user: AuthUser, @Param('id') id: string, @UploadedFiles() files: Express.Multer.File[] | undefined): Promise<AttachmentDto[]> {
    return this.reports.addAttachments(user, id, files ?? []);
  }

  /** The stored file, to the author and (once submitted) moderators only. */
  @Get(':id/attachments/:attachmentId')
  async attachment(@CurrentUser() user: AuthUser, @Param('id') id: string, @Param('attachmentId') attachmentId: string, @Res() res: Response): Promise<void> {
    const { row, data } = await this.reports.attachment(user, id, attachmentId);
    const disposition = row.contentType === 'application/pdf' ? 'attachment' : 'inline';
    res.set({
      'Content-Type': row.contentType,
      'Content-Length': String(data.length),
      'Content-Disposition': `${disposition}; filename="${row.originalName.replace(/["\\]/g, '_')}"`,
      'X-Content-Type-Options': 'nosniff',
      'Content-Security-Policy': "default-src 'none'; sandbox",
      'Cache-Control': 'private, no-store',
    });
    res.end(data);
  }

  @Delete(':id/attachments/:attachmentId')
  @HttpCode(204)
  async removeAttachment(@CurrentUser() user: AuthUser, @Param('id') id: string, @Param('attachmentId') attachmentId: string): Promise<void> {
    await this.reports.removeAttachment(user, id, attachmentId);
  }
}
