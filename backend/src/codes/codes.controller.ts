import { BadRequestException, Controller, Get, HttpCode, Param, Post, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { CatalogueImportReport, CodeEntryDto, CodeIndexEntry, CodeSummaryDto, DecodeResponse, Page } from '@causeway/shared';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { CatalogueImportService } from './catalogue-import.service';
import { CodesService } from './codes.service';
import { CodeQuery, DecodeQuery, ImportCatalogueQuery, SearchCodesQuery } from './dto/codes.dto';

const MAX_CATALOGUE_BYTES = 5 * 1024 * 1024;

@ApiTags('codes')
@Controller()
export class CodesController {
  constructor(
    private readonly codes: CodesService,
    private readonly importer: CatalogueImportService,
  ) {}

  /** Public: any syntactically valid code, known or not. */
  @Public()
  @Get('dtc/decode')
  decode(@Query() query: DecodeQuery): Promise<DecodeResponse> {
    return this.codes.decode(query.input, query.status);
  }

  @ApiBearerAuth()
  @Get('codes')
  search(@Query() query: SearchCodesQuery): Promise<Page<CodeSummaryDto>> {
    return this.codes.search(query);
  }

  @ApiBearerAuth()
  @Get('codes/index')
  index(): Promise<CodeIndexEntry[]> {
    return this.codes.index();
  }

  @ApiBearerAuth()
  @Get('codes/:code')
  get(@Param('code') code: string, @Query() query: CodeQuery): Promise<CodeEntryDto> {
    return this.codes.get(code, query.make);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @Post('codes/import')
  @HttpCode(200)
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } } })
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: MAX_CATALOGUE_BYTES, files: 1 } }))
  import(@UploadedFile() file: Express.Multer.File | undefined, @Query() query: ImportCatalogueQuery): Promise<CatalogueImportReport> {
    if (!file) throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: 'file: is required (multipart field "file")', errors: [{ field: 'file', message: 'is required' }] });
    return this.importer.import(file.buffer, query.dryRun);
  }
}
