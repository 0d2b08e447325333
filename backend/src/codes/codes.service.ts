import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, In, Repository } from 'typeorm';
import {
  decodeStatusByte,
  parseDtc,
  parseStatusByte,
  type CautionDto,
  type CodeEntryDto,
  type CodeIndexEntry,
  type CodeSummaryDto,
  type DecodeResponse,
  type DtcStructure,
  type Page,
} from '@causeway/shared';
import { defaultCautionsFor } from './default-cautions';
import type { SearchCodesQuery } from './dto/codes.dto';
import { DtcCode } from './entities/dtc-code.entity';
import { SafetyCaution } from './entities/safety-caution.entity';

/** Parses a code or answers 400 naming the position and the rule. */
export function parseCodeOr400(input: string, field = 'code'): DtcStructure {
  const parsed = parseDtc(input);
  if (!parsed.ok) {
    const { position, message } = parsed.error;
    throw new BadRequestException({
      statusCode: 400,
      error: 'Bad Request',
      message: `${field}: ${message}`,
      errors: [{ field, message: position ? `position ${position}: ${message}` : message }],
      details: parsed.error,
    });
  }
  return parsed.value;
}

function likeEscape(s: string): string {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export function toSummary(row: DtcCode): CodeSummaryDto {
  return { code: row.code, make: row.make || null, title: row.title, subsystem: row.subsystem, system: row.system, control: row.control };
}

@Injectable()
export class CodesService {
  constructor(
    @InjectRepository(DtcCode) private readonly codes: Repository<DtcCode>,
    @InjectRepository(SafetyCaution) private readonly cautions: Repository<SafetyCaution>,
  ) {}

  async decode(input: string, status?: string): Promise<DecodeResponse> {
    const structure = parseCodeOr400(input, 'input');
    let statusOut: DecodeResponse['status'] = null;
    if (status !== undefined && status !== '') {
      const byte = parseStatusByte(status);
      if (byte === null) {
        throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: 'status: must be one byte in hexadecimal, such as 0x2F or 2F', errors: [{ field: 'status', message: 'must be one byte in hexadecimal, such as 0x2F or 2F' }] });
      }
      statusOut = { byte, hex: byte.toString(16).toUpperCase().padStart(2, '0'), bits: decodeStatusByte(byte) };
    }
    const known = await this.codes.findOne({ where: { code: structure.code }, order: { make: 'ASC' } });
    return { input, structure, known: known ? { title: known.title, make: known.make || null } : null, status: statusOut };
  }

  async search(q: SearchCodesQuery): Promise<Page<CodeSummaryDto>> {
    const qb = this.codes.createQueryBuilder('c');
    const text = q.q?.trim();
    if (text) {
      const prefix = text.toUpperCase().replace(/\s+/g, '');
      if (/^[PCBU][0-3]?[0-9A-F]{0,3}$/.test(prefix)) {
        qb.andWhere("c.code LIKE :prefix ESCAPE '\\'", { prefix: `${likeEscape(prefix)}%` });
      } else {
        const words = text.toLowerCase().split(/\s+/).filter(Boolean).slice(0, 8);
        words.forEach((word, i) => {
          const param = `w${i}`;
          qb.andWhere(
            new Brackets((w) =>
              w
                .where(`LOWER(c.title) LIKE :${param} ESCAPE '\\'`)
                .orWhere(`LOWER(c.description) LIKE :${param} ESCAPE '\\'`)
                .orWhere(`LOWER(c.symptoms) LIKE :${param} ESCAPE '\\'`)
                .orWhere(`LOWER(c.subsystem) LIKE :${param} ESCAPE '\\'`)
                .orWhere(`LOWER(c.code) LIKE :${param} ESCAPE '\\'`),
            ),
            { [param]: `%${likeEscape(word)}%` },
          );
        });
      }
    }
    if (q.system) qb.andWhere('c.system = :system', { system: q.system });
    if (q.control) qb.andWhere('c.control = :control', { control: q.control });
    if (q.make) qb.andWhere("(c.make = '' OR LOWER(c.make) = :make)", { make: q.make.toLowerCase() });
    const dir = q.order === 'desc' ? 'DESC' : 'ASC';
    qb.orderBy(`c.${q.sort}`, dir);
    if (q.sort !== 'code') qb.addOrderBy('c.code', 'ASC');
    qb.addOrderBy('c.make', 'ASC');
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [rows, total] = await qb.getManyAndCount();
    return { items: rows.map(toSummary), total, page: q.page, pageSize: q.pageSize };
  }

  /** Everything the client's fuzzy search needs, in one small response it caches. */
  async index(): Promise<CodeIndexEntry[]> {
    const rows = await this.codes.find({ order: { code: 'ASC', make: 'ASC' } });
    return rows.map((r) => ({ ...toSummary(r), symptoms: r.symptoms.join('; ') }));
  }

  /** The entry for a code: this make's meaning when there is one, else the generic one. */
  async findEntry(code: string, make?: string): Promise<DtcCode | null> {
    const rows = await this.codes.find({ where: { code } });
    const wanted = make?.toLowerCase();
    return rows.find((r) => wanted && r.make.toLowerCase() === wanted) ?? rows.find((r) => r.make === '') ?? (wanted ? null : (rows[0] ?? null));
  }

  async get(input: string, make?: string): Promise<CodeEntryDto> {
    const structure = parseCodeOr400(input, 'code');
    const row = await this.findEntry(structure.code, make);
    if (!row) {
      throw new NotFoundException({
        statusCode: 404,
        error: 'Not Found',
        message: `${structure.code} is a valid code but is not in the catalogue${make ? ` for ${make}` : ''}`,
        details: { structure },
      });
    }
    const others = await this.codes.find({ where: { code: structure.code }, select: { make: true } });
    return {
      ...toSummary(row),
      description: row.description,
      symptoms: row.symptoms,
      verification: { monitor: row.verificationMonitor, procedure: row.verificationProcedure, hours: row.verificationHours },
      escalation: row.escalationHours === null ? null : { hours: row.escalationHours, description: row.escalationDescription },
      cautions: await this.cautionsFor(row.cautions.length ? row.cautions : defaultCautionsFor(structure)),
      structure,
      source: row.source,
      otherMakes: others.map((o) => o.make).filter((m) => m && m !== row.make),
    };
  }

  async cautionsFor(keys: string[]): Promise<CautionDto[]> {
    if (keys.length === 0) return [];
    const rows = await this.cautions.find({ where: { key: In(keys) } });
    const byKey = new Map(rows.map((r) => [r.key, r]));
    return keys.flatMap((k) => {
      const r = byKey.get(k);
      return r ? [{ key: r.key, title: r.title, points: r.points, sources: r.sources }] : [];
    });
  }
}
