import { BadRequestException, ConflictException, Injectable, InternalServerErrorException, Logger, NotFoundException, PayloadTooLargeException, type OnModuleInit } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { setImmediate as yieldToEventLoop } from 'node:timers/promises';
import { DataSource, In, Repository, type EntityTarget } from 'typeorm';
import {
  IMPORT_LIMITS,
  IMPORT_REQUIRED_FIELDS,
  validateVin,
  type ImportDetected,
  type ImportDto,
  type ImportField,
  type ImportMappingDto,
  type ImportMappingInput,
  type ImportMissingColumnsDetails,
  type ImportReport,
  type ImportSummaryDto,
  type Page,
} from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { validationFailed } from '../common/validation';
import { RunLeases } from '../database/run-leases';
import { ShopsService } from '../shops/shops.service';
import { JobCode } from '../jobs/entities/job-code.entity';
import { Job } from '../jobs/entities/job.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { FileProblem, checkText, detectLayout, sampleText } from './csv/detect';
import { HEADER_ALIASES, detectMapping, mergeMapping, resolveColumns, validateMappingInput } from './csv/mapping';
import { readRecords, type CsvRecord } from './csv/reader';
import type { ImportListQueryDto, ImportUploadBody, ImportUploadQuery, SaveImportMappingDto } from './dto/imports.dto';
import { CsvImport } from './entities/csv-import.entity';
import { ImportMappingEntity } from './entities/import-mapping.entity';
import { importLimits } from './import-limits';
import { RowChecker, type NormalRow } from './rows';
import { ImportTransactions } from './transaction';
import { uuid7 } from './uuid7';
import { WRITTEN_COLUMNS, dbTime, writeRows, type SqlOp, type WriteResult } from './writer';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const FIELD_LABELS: Record<ImportField, string> = {
  date: 'date', time: 'time', vin: 'VIN', odometer: 'odometer', odometerUnit: 'odometer unit', module: 'module', code: 'code', status: 'status', description: 'description', make: 'make', model: 'model', year: 'year', engine: 'engine', plate: 'plate',
};
const PROGRESS_EVERY_MS = 200;

function fileError(problem: FileProblem): BadRequestException | PayloadTooLargeException {
  const body = { statusCode: problem.status, error: problem.status === 413 ? 'Payload Too Large' : 'Bad Request', message: `file: ${problem.message}`, errors: [{ field: 'file', message: problem.message }] };
  return problem.status === 413 ? new PayloadTooLargeException(body) : new BadRequestException(body);
}

function fieldError(field: string, message: string): BadRequestException {
  return validationFailed([{ field, message }]);
}

function cleanFileName(name: string | undefined): string {
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, '').trim();
  return (clean || 'upload.csv').slice(0, 255);
}

const isBlank = (cells: string[]) => cells.every((c) => c.trim() === '');

/**
 * Scan-tool CSV import: checks the upload, detects its layout and columns, reads and checks every
 * row as it streams, then writes the valid rows in one transaction (or rehearses it and rolls back
 * for a dry run). Keeps the history of commits with their reports, and the shop's saved mappings.
 */
@Injectable()
export class ImportsService implements OnModuleInit {
  private readonly logger = new Logger('Imports');
  private readonly tx: ImportTransactions;
  /** Set when another module's table gained a required column the writer does not fill. */
  private schemaProblem: string | null = null;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(CsvImport) private readonly imports: Repository<CsvImport>,
    @InjectRepository(ImportMappingEntity) private readonly mappings: Repository<ImportMappingEntity>,
    private readonly shops: ShopsService,
    private readonly leases: RunLeases,
  ) {
    this.tx = new ImportTransactions(dataSource);
  }

  async onModuleInit(): Promise<void> {
    // An import still 'running' at start-up whose lease no instance holds was cut off by a stop of its server: its one
    // transaction never committed. (On PostgreSQL another instance may be running it right now: database/run-leases.ts.)
    // Its phase is kept: it says whether the stop came while reading or in the middle of writing.
    const running = await this.imports.find({ select: { id: true }, where: { status: 'running' } });
    const abandoned: string[] = [];
    for (const r of running) if (await this.leases.abandoned(`import:${r.id}`)) abandoned.push(r.id);
    if (abandoned.length) {
      await this.imports.update(
        { id: In(abandoned), status: 'running' },
        { status: 'interrupted', finishedAt: new Date(), message: 'The server stopped while this import ran; none of its rows were written. Upload the file again.' },
      );
    }
    this.schemaProblem = this.checkWrittenTables();
    if (this.schemaProblem) this.logger.error(this.schemaProblem);
  }

  /** The writer fills only some columns of vehicles, jobs and job codes; every other must be optional. */
  private checkWrittenTables(): string | null {
    const problems: string[] = [];
    const tables: Array<[EntityTarget<unknown>, readonly string[]]> = [
      [Vehicle, WRITTEN_COLUMNS.vehicles],
      [Job, WRITTEN_COLUMNS.jobs],
      [JobCode, WRITTEN_COLUMNS.job_codes],
    ];
    for (const [entity, written] of tables) {
      if (!this.dataSource.hasMetadata(entity)) continue;
      const meta = this.dataSource.getMetadata(entity);
      for (const name of written) {
        if (!meta.findColumnWithDatabaseName(name)) problems.push(`${meta.tableName}.${name} no longer exists`);
      }
      for (const c of meta.columns) {
        const optional = c.isNullable || c.default !== undefined || c.isCreateDate || c.isUpdateDate || c.isVersion || c.isVirtual || c.relationMetadata !== undefined;
        if (!optional && !written.includes(c.databaseName)) problems.push(`${meta.tableName}.${c.databaseName} is required but not written`);
      }
    }
    return problems.length ? `The scan-tool import is out of step with the schema: ${problems.join('; ')}` : null;
  }

  // ------------------------------------------------------------ upload

  async upload(user: AuthUser, file: Express.Multer.File | undefined, body: ImportUploadBody, q: ImportUploadQuery): Promise<ImportReport> {
    const shop = await this.shops.shopOf(user);
    if (!file) throw fieldError('file', 'is required: send the CSV export as the multipart field "file"');
    if (this.schemaProblem) {
      this.logger.error(this.schemaProblem);
      throw new InternalServerErrorException('The import cannot write jobs at the moment; nothing was changed');
    }
    const limits = importLimits();

    let input: ImportMappingInput | null = null;
    if (body?.mapping !== undefined && body.mapping.trim() !== '') {
      let json: unknown;
      try {
        json = JSON.parse(body.mapping);
      } catch {
        throw fieldError('mapping', 'is not valid JSON');
      }
      const checked = validateMappingInput(json, 'mapping');
      if (checked.errors.length) throw validationFailed(checked.errors);
      input = checked.mapping;
    }
    let saved: ImportMappingEntity | null = null;
    if (body?.mappingName !== undefined && body.mappingName.trim() !== '') {
      saved = await this.mappings.findOne({ where: { shopId: shop.id, name: body.mappingName.trim() } });
      if (!saved) throw fieldError('mappingName', `no mapping named "${body.mappingName.trim()}" is saved for this shop`);
    }

    const buf = file.buffer;
    let shape: ReturnType<typeof checkText>;
    try {
      shape = checkText(buf);
    } catch (err) {
      if (err instanceof FileProblem) throw fileError(err);
      throw err;
    }
    const layout = detectLayout(sampleText(buf, shape.offset));
    const records = readRecords(buf, shape.offset, layout.delimiter, layout.lineEnding);
    let importRow: CsvImport | null = null;
    let releaseLease = async (): Promise<void> => undefined;
    try {
      // Header: the first line that is not blank; the rest of its batch are data rows.
      let header: CsvRecord | null = null;
      let pending: CsvRecord[] = [];
      let bytes = 0;
      for (let n = await records.next(); !n.done; n = await records.next()) {
        const i = n.value.records.findIndex((r) => !isBlank(r.cells));
        if (i !== -1) {
          header = n.value.records[i];
          pending = n.value.records.slice(i + 1);
          bytes = n.value.bytes;
          break;
        }
      }
      if (!header) throw new FileProblem('is empty');
      const headers = header.cells.map((h) => h.replace(/^\uFEFF/, '').trim());

      const mapping = mergeMapping(detectMapping(headers), saved?.mapping, input);
      const { resolved, errors } = resolveColumns(mapping, headers, input ? 'mapping' : saved ? 'mappingName' : 'mapping');
      if (errors.length) throw validationFailed(errors);
      const missing = IMPORT_REQUIRED_FIELDS.filter((f) => resolved.index[f] === undefined);
      if (missing.length) throw this.missingColumns(missing, headers);
      const detected: ImportDetected = { delimiter: layout.delimiter, encoding: shape.encoding, lineEnding: layout.lineEnding, headers, mapping, unmapped: resolved.unmapped };

      const now = Date.now();
      const checker = new RowChecker(
        { resolved, mapping, distanceUnit: shop.distanceUnit, locale: shop.locale, delimiter: layout.delimiter, now, referenceYear: new Date(now).getUTCFullYear() },
        IMPORT_LIMITS.maxListed,
        IMPORT_LIMITS.previewRows,
      );

      if (!q.dryRun) {
        importRow = await this.startImport(q.id, shop.id, user.id, file, q.validOnly);
        releaseLease = await this.leases.hold(`import:${importRow.id}`);
      }

      const valid: NormalRow[] = [];
      let rows = 0;
      let lastProgress = Date.now();
      const take = (batch: CsvRecord[]) => {
        for (const rec of batch) {
          if (isBlank(rec.cells)) continue;
          rows += 1;
          if (rows > limits.maxRows) throw new FileProblem(`has more than ${limits.maxRows.toLocaleString('en-GB')} data rows, the limit for one import; split it into smaller files`);
          const row = checker.check(rec.line, rec.cells);
          if (row) valid.push(row);
        }
      };
      take(pending);
      for (let n = await records.next(); !n.done; n = await records.next()) {
        take(n.value.records);
        bytes = n.value.bytes;
        // Let other requests (progress polls among them) in between batches.
        await yieldToEventLoop();
        if (importRow && Date.now() - lastProgress >= PROGRESS_EVERY_MS) {
          lastProgress = Date.now();
          await this.imports.update({ id: importRow.id }, { bytesProcessed: bytes, rowsProcessed: rows });
        }
      }
      if (rows === 0) throw new FileProblem('has a header line but no data rows');

      const rejected = rows - valid.length;
      const refused = !q.validOnly && rejected > 0;
      const report: ImportReport = {
        importId: importRow?.id ?? null,
        fileName: cleanFileName(file.originalname),
        dryRun: q.dryRun,
        validOnly: q.validOnly,
        committed: false,
        refused,
        rows,
        accepted: valid.length,
        rejected,
        skippedDuplicates: 0,
        createdVehicles: 0,
        updatedVehicles: 0,
        createdJobs: 0,
        createdCodes: 0,
        problems: checker.problems,
        problemsTotal: checker.problemsTotal,
        corrections: checker.corrections,
        correctionsTotal: checker.correctionsTotal,
        preview: checker.preview,
        detected,
      };
      const fill = (result: WriteResult) => {
        const { duplicateLines, ...counts } = result;
        Object.assign(report, counts);
        for (const p of report.preview) p.duplicate = duplicateLines.includes(p.line);
      };
      const ctx = { shopId: shop.id, userId: user.id, fileName: report.fileName, now: dbTime(now), previewLines: new Set(checker.preview.map((p) => p.line)) };
      const modelYearOf = (vin: string) => validateVin(vin, { referenceYear: new Date(now).getUTCFullYear() }).modelYear;

      if (q.dryRun) {
        // The commit rehearsed and rolled back: the counts are exactly what importing the valid rows would do.
        const importId = randomUUID();
        const placeholder: SqlOp = {
          kind: 'run',
          sql: 'INSERT INTO "imports" ("id", "shopId", "fileName", "fileBytes", "status", "validOnly", "phase") VALUES (?, ?, ?, ?, \'running\', ?, \'writing\')',
          params: [importId, shop.id, report.fileName, buf.length, q.validOnly ? 1 : 0],
        };
        fill(await this.tx.run(writeRows({ ...ctx, importId }, valid, modelYearOf), () => [], true, [placeholder]));
        return report;
      }

      const id = importRow!.id;
      if (refused) {
        await this.imports.update({ id }, { ...this.counts(report), status: 'refused', phase: 'done', bytesProcessed: buf.length, rowsProcessed: rows, report, finishedAt: new Date() });
        return report;
      }
      await this.imports.update({ id }, { phase: 'writing', bytesProcessed: buf.length, rowsProcessed: rows });
      await yieldToEventLoop();
      await this.tx.run(
        writeRows({ ...ctx, importId: id }, valid, modelYearOf),
        (result) => {
          fill(result);
          report.committed = true;
          const c = this.counts(report);
          return [
            {
              kind: 'run',
              sql: 'UPDATE "imports" SET "status" = \'committed\', "phase" = \'done\', "rows" = ?, "accepted" = ?, "rejected" = ?, "skippedDuplicates" = ?, "createdVehicles" = ?, "updatedVehicles" = ?, "createdJobs" = ?, "createdCodes" = ?, "report" = ?, "finishedAt" = ? WHERE "id" = ?',
              params: [c.rows, c.accepted, c.rejected, c.skippedDuplicates, c.createdVehicles, c.updatedVehicles, c.createdJobs, c.createdCodes, JSON.stringify(report), dbTime(Date.now()), id],
            },
          ];
        },
        false,
      );
      return report;
    } catch (err) {
      const problem = err instanceof FileProblem ? err : null;
      if (importRow) {
        const message = problem ? `file: ${problem.message}` : err instanceof ConflictException ? err.message : 'The import stopped on a server error; none of its rows were written.';
        await this.imports.update({ id: importRow.id }, { status: 'failed', phase: 'done', message, finishedAt: new Date() }).catch(() => undefined);
      }
      if (problem) throw fileError(problem);
      if (isUniqueViolation(err)) throw new ConflictException('Another import wrote some of these rows at the same moment; nothing of this one was written. Upload it again.');
      throw err;
    } finally {
      await releaseLease();
      await records.return(undefined);
    }
  }

  private counts(r: ImportReport) {
    return { rows: r.rows, accepted: r.accepted, rejected: r.rejected, skippedDuplicates: r.skippedDuplicates, createdVehicles: r.createdVehicles, updatedVehicles: r.updatedVehicles, createdJobs: r.createdJobs, createdCodes: r.createdCodes };
  }

  private missingColumns(missing: ImportField[], headers: string[]): BadRequestException {
    const shown = headers.filter(Boolean).map((h) => `"${h.slice(0, 40)}"`).slice(0, 20).join(', ') || 'none';
    const errors = missing.map((f) => ({
      field: 'file',
      message: `has no ${FIELD_LABELS[f]} column (headers found: ${shown}); name one ${HEADER_ALIASES[f].slice(0, 6).map((a) => `"${a}"`).join(', ')}…, or map it with mapping.columns.${f}`,
    }));
    const details: ImportMissingColumnsDetails = { missing, headers };
    return new BadRequestException({ statusCode: 400, error: 'Bad Request', message: `file: has no ${missing.map((f) => FIELD_LABELS[f]).join(', ')} column`, errors, details });
  }

  private async startImport(id: string | undefined, shopId: string, userId: string, file: Express.Multer.File, validOnly: boolean): Promise<CsvImport> {
    if (id && (await this.imports.exist({ where: { id } }))) {
      throw new ConflictException({ statusCode: 409, error: 'Conflict', message: 'id: is already the id of an import', errors: [{ field: 'id', message: 'is already the id of an import; choose a new UUID' }] });
    }
    const row = this.imports.create({
      // Time-ordered unless the client chose one; createdAt to the millisecond, so that the history's order is the upload order.
      id: id ?? uuid7(),
      createdAt: new Date(),
      shopId,
      createdById: userId,
      fileName: cleanFileName(file.originalname),
      fileBytes: file.size,
      status: 'running',
      validOnly,
      phase: 'reading',
      bytesProcessed: 0,
      rowsProcessed: 0,
      report: null,
      message: null,
      finishedAt: null,
    });
    return this.imports.save(row);
  }

  // ------------------------------------------------------------ history

  async list(user: AuthUser, q: ImportListQueryDto): Promise<Page<ImportSummaryDto>> {
    const shop = await this.shops.shopOf(user);
    const [rows, total] = await this.imports.findAndCount({
      where: { shopId: shop.id, ...(q.status ? { status: q.status } : {}) },
      relations: { createdBy: true },
      select: this.summaryColumns(),
      order: { createdAt: 'DESC', id: 'DESC' },
      skip: (q.page - 1) * q.pageSize,
      take: q.pageSize,
    });
    return { items: rows.map((r) => this.toSummary(r)), total, page: q.page, pageSize: q.pageSize };
  }

  async get(user: AuthUser, id: string): Promise<ImportDto> {
    const shop = await this.shops.shopOf(user);
    const row = UUID.test(id) ? await this.imports.findOne({ where: { id, shopId: shop.id }, relations: { createdBy: true } }) : null;
    if (!row) throw new NotFoundException('Import not found');
    return { ...this.toSummary(row), message: row.message, report: row.report };
  }

  private summaryColumns() {
    return {
      id: true, shopId: true, fileName: true, fileBytes: true, status: true, validOnly: true, phase: true, bytesProcessed: true, rowsProcessed: true,
      rows: true, accepted: true, rejected: true, skippedDuplicates: true, createdVehicles: true, updatedVehicles: true, createdJobs: true, createdCodes: true,
      createdAt: true, finishedAt: true, createdById: true, createdBy: { id: true, displayName: true },
    } as const;
  }

  private toSummary(r: CsvImport): ImportSummaryDto {
    return {
      id: r.id,
      fileName: r.fileName,
      fileBytes: r.fileBytes,
      status: r.status,
      validOnly: Boolean(r.validOnly),
      rows: r.rows,
      accepted: r.accepted,
      rejected: r.rejected,
      skippedDuplicates: r.skippedDuplicates,
      createdVehicles: r.createdVehicles,
      updatedVehicles: r.updatedVehicles,
      createdJobs: r.createdJobs,
      createdCodes: r.createdCodes,
      progress: { phase: r.phase, bytesProcessed: r.bytesProcessed, bytesTotal: r.fileBytes, rowsProcessed: r.rowsProcessed },
      createdBy: r.createdBy ? { id: r.createdBy.id, displayName: r.createdBy.displayName } : null,
      createdAt: new Date(r.createdAt).toISOString(),
      finishedAt: r.finishedAt ? new Date(r.finishedAt).toISOString() : null,
    };
  }

  // ------------------------------------------------------------ saved mappings

  async listMappings(user: AuthUser): Promise<ImportMappingDto[]> {
    const shop = await this.shops.shopOf(user);
    const rows = await this.mappings.find({ where: { shopId: shop.id }, order: { name: 'ASC' }, take: 200 });
    return rows.map(toMappingDto);
  }

  async saveMapping(user: AuthUser, dto: SaveImportMappingDto): Promise<ImportMappingDto> {
    const shop = await this.shops.shopOf(user);
    const checked = validateMappingInput(dto.mapping, 'mapping');
    if (checked.errors.length) throw validationFailed(checked.errors);
    const existing = await this.mappings.findOne({ where: { shopId: shop.id, name: dto.name } });
    const row = existing ?? this.mappings.create({ shopId: shop.id, name: dto.name, createdById: user.id });
    row.mapping = checked.mapping!;
    return toMappingDto(await this.mappings.save(row));
  }

  async deleteMapping(user: AuthUser, id: string): Promise<void> {
    const shop = await this.shops.shopOf(user);
    const row = UUID.test(id) ? await this.mappings.findOne({ where: { id, shopId: shop.id } }) : null;
    if (!row) throw new NotFoundException('Mapping not found');
    await this.mappings.remove(row);
  }
}

function toMappingDto(m: ImportMappingEntity): ImportMappingDto {
  return { id: m.id, name: m.name, mapping: m.mapping, createdAt: new Date(m.createdAt).toISOString(), updatedAt: new Date(m.updatedAt).toISOString() };
}

function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; driverError?: { code?: string } };
  const code = e?.driverError?.code ?? e?.code;
  return code === 'SQLITE_CONSTRAINT_UNIQUE' || code === '23505';
}
