import { Injectable, Logger } from '@nestjs/common';
import { parse } from 'csv-parse/sync';
import { readFileSync } from 'node:fs';
import type { EntityManager } from 'typeorm';
import { parseDtc } from '@causeway/shared';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { SafetyCaution } from '../codes/entities/safety-caution.entity';
import { readSeed, seedPath } from './seed-files';

interface Correction { line: number; code: string; correctedCode?: string; title?: string; add?: Array<{ code: string; title: string }>; reason: string }
interface CodeSeed {
  code: string;
  make: string | null;
  title: string;
  description: string;
  subsystem: string;
  symptoms: string[];
  verification: { monitor: string; procedure: string; hours: number };
  escalation: { hours: number; description: string } | null;
  cautions: string[];
}
interface CautionSeed { key: string; title: string; points: string[]; sources: string[] }

/** Generic P0100–P0999 titles from the vendored MIT dataset, with its known faults corrected. */
export function readReferenceTitles(): Map<string, string> {
  const csv = readFileSync(seedPath('reference', 'dtcdb', 'generic.csv'), 'utf8');
  const corrections = readSeed<Correction[]>('catalogue', 'dtcdb-corrections.json');
  const byLine = new Map(corrections.map((c) => [c.line, c]));
  const rows = parse(csv, { relax_column_count: true, relax_quotes: true, skip_empty_lines: false, trim: true }) as string[][];
  const titles = new Map<string, string>();
  rows.forEach((row, i) => {
    const line = i + 1;
    const [rawCode, ...rest] = row;
    const code = (rawCode ?? '').toUpperCase();
    if (!/^P[0-9A-F]{4}$/.test(code)) return; // section titles and the header
    const fix = byLine.get(line);
    const title = rest.join(',').trim();
    if (fix?.add) {
      for (const extra of fix.add) titles.set(extra.code, extra.title);
      if (!fix.correctedCode && !fix.title) return;
    }
    titles.set(fix?.correctedCode ?? code, fix?.title ?? title);
  });
  return titles;
}

/** The code catalogue and safety cautions: reference data, loaded on an empty database even without the demo. */
@Injectable()
export class CatalogueSeeder {
  private readonly logger = new Logger(CatalogueSeeder.name);

  async run(em: EntityManager): Promise<void> {
    const cautions = readSeed<CautionSeed[]>('safety', 'cautions.json');
    await em.getRepository(SafetyCaution).save(cautions.map((c) => ({ key: c.key, title: c.title, points: c.points, sources: c.sources })));

    const entries = new Map<string, Partial<DtcCode>>();
    for (const [code, title] of readReferenceTitles()) {
      const parsed = parseDtc(code);
      if (!parsed.ok) continue;
      const s = parsed.value;
      entries.set(`${code}|`, { code, make: '', system: s.system, control: s.control, title, description: '', subsystem: s.group, symptoms: [], cautions: [], source: 'reference', escalationHours: null });
    }
    for (const c of readSeed<CodeSeed[]>('catalogue', 'codes.json')) {
      const parsed = parseDtc(c.code);
      if (!parsed.ok) throw new Error(`seeds/catalogue/codes.json: ${c.code}: ${parsed.error.message}`);
      const s = parsed.value;
      entries.set(`${s.code}|${c.make ?? ''}`, {
        code: s.code,
        make: c.make ?? '',
        system: s.system,
        control: s.control,
        title: c.title,
        description: c.description,
        subsystem: c.subsystem || s.group,
        symptoms: c.symptoms,
        verificationMonitor: c.verification?.monitor ?? '',
        verificationProcedure: c.verification?.procedure ?? '',
        verificationHours: c.verification?.hours ?? 0.5,
        escalationHours: c.escalation?.hours ?? null,
        escalationDescription: c.escalation?.description ?? '',
        cautions: c.cautions,
        source: 'causeway',
      });
    }
    const repo = em.getRepository(DtcCode);
    const all = [...entries.values()].map((e) => repo.create(e));
    for (let i = 0; i < all.length; i += 200) await repo.save(all.slice(i, i + 200));
    this.logger.log(`Catalogue: ${all.length} code entries, ${cautions.length} safety cautions`);
  }
}
