import { Body, Controller, Delete, Get, HttpCode, Param, Post, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { ImportDto, ImportMappingDto, ImportReport, ImportSummaryDto, Page } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ImportListQueryDto, ImportUploadBody, ImportUploadQuery, SaveImportMappingDto } from './dto/imports.dto';
import { ImportsService } from './imports.service';
import { ImportUploadInterceptor } from './upload.interceptor';

@ApiTags('imports')
@ApiBearerAuth()
@Controller('imports')
export class ImportsController {
  constructor(private readonly imports: ImportsService) {}

  // Declared before ':id' so that "mappings" is not read as an import id.
  @Get('mappings')
  @ApiOperation({ summary: "The shop's saved column mappings" })
  listMappings(@CurrentUser() user: AuthUser): Promise<ImportMappingDto[]> {
    return this.imports.listMappings(user);
  }

  @Post('mappings')
  @ApiOperation({ summary: 'Save a column mapping under a name (an existing name is replaced)' })
  saveMapping(@CurrentUser() user: AuthUser, @Body() dto: SaveImportMappingDto): Promise<ImportMappingDto> {
    return this.imports.saveMapping(user, dto);
  }

  @Delete('mappings/:id')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a saved mapping' })
  deleteMapping(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<void> {
    return this.imports.deleteMapping(user, id);
  }

  @Post()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Upload a scan-tool CSV export: detect, map, check, preview; commit with dryRun=false',
    description:
      'UTF-8 (with or without BOM), comma, semicolon or tab separated. Required columns: VIN, code, date. ' +
      'Dates: ISO 8601, YYYY-MM-DD HH:mm[:ss], DD/MM/YYYY [HH:mm] (MM/DD/YYYY for an en-US shop, or mapping.dateOrder), DD.MM.YYYY [HH:mm]; a time without offset is UTC. ' +
      'A file with any rejected row is refused whole unless validOnly=true. Rows already imported are skipped.',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: { type: 'string', format: 'binary' },
        mapping: { type: 'string', description: 'JSON: {"columns":{"code":"DTC"},"freezeFrame":[{"header":"RPM","key":"rpm"}],"odometerUnit":"mi","dateOrder":"DMY","statusValues":{"h":"stored"}}' },
        mappingName: { type: 'string' },
      },
    },
  })
  @UseInterceptors(ImportUploadInterceptor)
  upload(@CurrentUser() user: AuthUser, @UploadedFile() file: Express.Multer.File | undefined, @Body() body: ImportUploadBody, @Query() query: ImportUploadQuery): Promise<ImportReport> {
    return this.imports.upload(user, file, body, query);
  }

  @Get()
  @ApiOperation({ summary: "The shop's import history, newest first" })
  list(@CurrentUser() user: AuthUser, @Query() query: ImportListQueryDto): Promise<Page<ImportSummaryDto>> {
    return this.imports.list(user, query);
  }

  @Get(':id')
  @ApiOperation({ summary: 'One import with its report; poll it for progress while it runs' })
  get(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<ImportDto> {
    return this.imports.get(user, id);
  }
}
