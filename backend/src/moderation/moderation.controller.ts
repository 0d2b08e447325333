import { Body, Controller, Delete, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import type { CodeEntryDto, PartDto, PossibleCauseRowDto, TeardownDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CodesService } from '../codes/codes.service';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { Part } from '../knowledge/entities/part.entity';
import { toCauseRowDto, toPartDto, toTeardownDto } from '../knowledge/knowledge.service';
import { CodeEditDto, CodeEditQuery, CreateCauseDto, CreatePartDto, CreateTeardownDto, UpdateCauseDto, UpdatePartDto, UpdateTeardownDto } from './dto/knowledge-edit.dto';
import { KnowledgeEditsService } from './knowledge-edits.service';

/**
 * Direct edits of the knowledge base (moderators and admins). Reading it is the knowledge
 * routes' job (`GET /api/parts`, `/api/teardowns`, `/api/causes`); every write here is
 * audited in the same transaction.
 */
@ApiTags('knowledge edits')
@ApiBearerAuth()
@Roles('moderator')
@Controller('knowledge')
export class ModerationController {
  constructor(
    private readonly edits: KnowledgeEditsService,
    private readonly codes: CodesService,
    @InjectRepository(Part) private readonly parts: Repository<Part>,
  ) {}

  @Patch('codes/:code')
  async updateCode(@CurrentUser() user: AuthUser, @Param('code') code: string, @Query() query: CodeEditQuery, @Body() dto: CodeEditDto): Promise<CodeEntryDto> {
    const saved = await this.edits.updateCode(user, code, query.make, dto);
    return this.codes.get(saved.code, saved.make || undefined);
  }

  @Post('parts')
  async createPart(@CurrentUser() user: AuthUser, @Body() dto: CreatePartDto): Promise<PartDto> {
    return toPartDto(await this.edits.createPart(user, dto));
  }

  @Patch('parts/:key')
  async updatePart(@CurrentUser() user: AuthUser, @Param('key') key: string, @Body() dto: UpdatePartDto): Promise<PartDto> {
    return toPartDto(await this.edits.updatePart(user, key, dto));
  }

  @Post('teardowns')
  async createTeardown(@CurrentUser() user: AuthUser, @Body() dto: CreateTeardownDto): Promise<TeardownDto> {
    return toTeardownDto(await this.edits.createTeardown(user, dto));
  }

  @Patch('teardowns/:key')
  async updateTeardown(@CurrentUser() user: AuthUser, @Param('key') key: string, @Body() dto: UpdateTeardownDto): Promise<TeardownDto> {
    return toTeardownDto(await this.edits.updateTeardown(user, key, dto));
  }

  @Post('causes')
  async createCause(@CurrentUser() user: AuthUser, @Body() dto: CreateCauseDto): Promise<PossibleCauseRowDto> {
    return this.causeDto(await this.edits.createCause(user, dto));
  }

  @Patch('causes/:id')
  async updateCause(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() dto: UpdateCauseDto): Promise<PossibleCauseRowDto> {
    return this.causeDto(await this.edits.updateCause(user, id, dto));
  }

  @Delete('causes/:id')
  @HttpCode(204)
  async deleteCause(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<void> {
    await this.edits.deleteCause(user, id);
  }

  private async causeDto(c: Awaited<ReturnType<KnowledgeEditsService['createCause']>>): Promise<PossibleCauseRowDto> {
    const part = await this.parts.findOne({ where: { key: c.partKey } });
    return toCauseRowDto(c, part?.name);
  }
}
