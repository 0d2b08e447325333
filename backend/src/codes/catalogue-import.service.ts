import { BadRequestException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { parse } from 'csv-parse/sync';
import { DataSource } from 'typeorm';
import { parseDtc, type CatalogueImportReport, type ImportProblem } from '@causeway/shared';
import { VersionedCache } from '../common/cache/versioned-cache.service';
import { DtcCode } from './entities/dtc-code.entity';
import { SafetyCaution } from './entities/safety-caution.entity';

/** Columns of a catalogue file, with the header spellings accepted for each. */
const COLUMNS = {
  code: ['code', 'dtc', 'fault code'],
  make: ['make', 'manufacturer', 'brand'],
  title: ['title', 'name', 'definition'],
  description: ['description', 'meaning', 'details'],
  subsystem: ['subsystem', 'system group', 'group'],
  symptoms: ['symptoms'],
  verification_monitor: ['verification monitor', 'monitor'],
  verification_procedure: ['verification procedure', 'verification'],
  verification_hours: ['verification hours'],
  escalation_hours: ['escalation hours'],
  escalation_description: ['escalation description', 'escalation'],
  cautions: ['cautions', 'safety'],
} as const;
type Column = keyof typeof COLUMNS;

const MAX_ROWS = 50_000;

function headerKey(h: string): Column | null {
  const norm = h.replace(/^\uFEFF/, '').trim().toLowerCase().replace(/[_\-\s]+/g, ' ');
  for (const [key, aliases] of Object.entries(COLUMNS)) {
    if ((aliases as readonly string[]).includes(norm)) return key as Column;
  }
  return null;
}

function detectDelimiter(firstLine: string): string {
  const counts = [',', ';', '\t'].map((d) => [d, firstLine.split(d).length] as const);
  return counts.sort((a, b) => b[1] - a[1])[0][0];
}

function hoursOf(value: string, line: number, column: string, problems: ImportProblem[], nullable: boolean): number | null | undefined {
  if (value === '') return nullable ? null : undefined;
  const n = Number(value.replace(',', '.'));
  if (!Number.isFinite(n) || n < 0 || n > 200) {
    problems.push({ line, column, message: `"${value}" is not a number of hours between 0 and 200` });
    return undefined;
  }
  return n;
}

/**
 * An admin's import of a licensed catalogue file (CSV, UTF-8, comma, semicolon or tab).
 * Every row is checked; a dry run reports, a commit writes the valid file in one
 * transaction, and a file with any rejected row is refused whole.
 */
@Injectable()
export class CatalogueImportService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly cache: VersionedCache,
  ) {}

  async import(buffer: Buffer, dryRun: boolean): Promise<CatalogueImportReport> {
    const text = buffer.toString('utf8');
    if (text.includes('\u0000') || text.includes('\uFFFD')) {
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: 'file: is not UTF-8 text', errors: [{ field: 'file', message: 'is not UTF-8 text (binary or another encoding)' }] });
    }
    const body = text.replace(/^\uFEFF/, '');
    if (body.trim() === '') {
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: 'file: is empty', errors: [{ field: 'file', message: 'is empty' }] });
    }
    let records: string[][];
    try {
      records = parse(body, { delimiter: detectDelimiter(body.split(/\r?\n/, 1)[0]), relax_column_count: true, skip_empty_lines: true, trim: true, bom: true });
    } catch (err) {
      const e = err as { lines?: number; message?: string };
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `file: line ${e.lines ?? '?'}: ${e.message ?? 'not CSV'}`, errors: [{ field: 'file', message: `line ${e.lines ?? '?'}: ${e.message ?? 'not CSV'}` }] });
    }
    const [header, ...rows] = records;
    if (rows.length > MAX_ROWS) {
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `file: has ${rows.length} rows; at most ${MAX_ROWS}`, errors: [{ field: 'file', message: `has more than ${MAX_ROWS} rows` }] });
    }
    const map = new Map<Column, number>();
    header.forEach((h, i) => {
      const key = headerKey(h);
      if (key && !map.has(key)) map.set(key, i);
    });
    const problems: ImportProblem[] = [];
    for (const required of ['code', 'title'] as const) {
      if (!map.has(required)) problems.push({ line: 1, column: required, message: `no "${required}" column (accepted headers: ${COLUMNS[required].join(', ')})` });
    }
    if (problems.length) return { dryRun, rows: rows.length, accepted: 0, rejected: rows.length, created: 0, updated: 0, problems };

    const knownCautions = new Set((await this.dataSource.getRepository(SafetyCaution).find({ select: { key: true } })).map((c) => c.key));
    const get = (row: string[], key: Column) => (map.has(key) ? (row[map.get(key)!] ?? '').trim() : '');
    const valid: Array<Partial<DtcCode> & { code: string; make: string }> = [];
    const seen = new Set<string>();
    let rejected = 0;
    rows.forEach((row, i) => {
      const line = i + 2;
      const before = problems.length;
      const parsed = parseDtc(get(row, 'code'));
      if (!parsed.ok) problems.push({ line, column: 'code', message: parsed.error.position ? `position ${parsed.error.position}: ${parsed.error.message}` : parsed.error.message });
      const title = get(row, 'title');
      if (!title) problems.push({ line, column: 'title', message: 'is empty' });
      if (title.length > 200) problems.push({ line, column: 'title', message: 'is longer than 200 characters' });
      const make = get(row, 'make');
      if (make.length > 40) problems.push({ line, column: 'make', message: 'is longer than 40 characters' });
      const cautions = get(row, 'cautions').split(/[;|]/).map((s) => s.trim()).filter(Boolean);
      for (const c of cautions) if (!knownCautions.has(c)) problems.push({ line, column: 'cautions', message: `unknown caution "${c}" (known: ${[...knownCautions].join(', ')})` });
      const verificationHours = hoursOf(get(row, 'verification_hours'), line, 'verification_hours', problems, false);
      const escalationHours = hoursOf(get(row, 'escalation_hours'), line, 'escalation_hours', problems, true);
      if (parsed.ok) {
        const key = `${parsed.value.code}|${make.toLowerCase()}`;
        if (seen.has(key)) problems.push({ line, column: 'code', message: `${parsed.value.code}${make ? ` for ${make}` : ''} appears more than once in the file` });
        seen.add(key);
        if (parsed.value.corrections.length) problems.push({ line, column: 'code', message: `needs correction (${parsed.value.corrections.map((c) => c.message).join('; ')}); write it as ${parsed.value.code}` });
      }
      if (problems.length > before || !parsed.ok) {
        rejected += 1;
        return;
      }
      valid.push({
        code: parsed.value.code,
        make,
        system: parsed.value.system,
        control: parsed.value.control,
        title,
        description: get(row, 'description'),
        subsystem: get(row, 'subsystem') || parsed.value.group,
        symptoms: get(row, 'symptoms').split(';').map((s) => s.trim()).filter(Boolean),
        verificationMonitor: get(row, 'verification_monitor'),
        verificationProcedure: get(row, 'verification_procedure'),
        ...(verificationHours !== undefined && verificationHours !== null ? { verificationHours } : {}),
        escalationHours: escalationHours ?? null,
        escalationDescription: get(row, 'escalation_description'),
        cautions,
        source: 'import',
      });
    });

    const report: CatalogueImportReport = { dryRun, rows: rows.length, accepted: valid.length, rejected, created: 0, updated: 0, problems: problems.slice(0, 1000) };
    if (dryRun || rejected > 0) return report;
    await this.dataSource.transaction(async (em) => {
      await this.cache.bump('knowledge', em);
      const repo = em.getRepository(DtcCode);
      for (const entry of valid) {
        const existing = await repo.findOne({ where: { code: entry.code, make: entry.make } });
        if (existing) {
          await repo.save(repo.merge(existing, entry));
          report.updated += 1;
        } else {
          await repo.save(repo.create(entry));
          report.created += 1;
        }
      }
    });
    return report;
  }
}
