import { Injectable, Logger } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { FieldReportKind } from '@causeway/shared';
import { FieldReport } from '../field-reports/entities/field-report.entity';
import { FieldReportsService } from '../field-reports/field-reports.service';
import { User } from '../users/entities/user.entity';
import { readSeed } from './seed-files';

interface FieldReportSeed {
  kind: FieldReportKind;
  status: 'draft' | 'submitted';
  author: string;
  payload: Record<string, unknown>;
}

/**
 * The invented demo field reports (seeds/demo/field-reports.json): some waiting on the review
 * desk, some drafts. Each payload passes the same checks as one filed through the API, so a
 * seed that drifts from the knowledge base stops the demo load with the report named.
 */
@Injectable()
export class FieldReportsSeeder {
  private readonly logger = new Logger(FieldReportsSeeder.name);

  constructor(private readonly reports: FieldReportsService) {}

  async run(em: EntityManager): Promise<void> {
    const seeds = readSeed<FieldReportSeed[]>('demo', 'field-reports.json');
    const repo = em.getRepository(FieldReport);
    // Submitted an hour apart, oldest first, so the review queue has an order.
    const start = Date.now() - seeds.length * 3_600_000;
    for (const [i, s] of seeds.entries()) {
      const author = await em.getRepository(User).findOne({ where: { emailNormalized: s.author.toLowerCase() } });
      if (!author) throw new Error(`seeds/demo/field-reports.json item ${i}: unknown author ${s.author}`);
      let checked: Awaited<ReturnType<FieldReportsService['checkBody']>>;
      try {
        checked = await this.reports.checkBody(s.kind, s.payload, em);
      } catch (err) {
        const body = (err as { getResponse?: () => unknown }).getResponse?.();
        throw new Error(`seeds/demo/field-reports.json item ${i} (${s.kind} ${String(s.payload.code)}): ${JSON.stringify(body ?? (err as Error).message)}`);
      }
      const at = new Date(start + i * 3_600_000);
      await repo.save(
        repo.create({
          kind: s.kind,
          status: s.status,
          authorId: author.id,
          shopId: author.shopId,
          code: checked.payload.code,
          payload: checked.payload,
          proposesNewCode: checked.proposesNewCode,
          submittedAt: s.status === 'submitted' ? at : null,
          decidedAt: null,
          decidedById: null,
          decisionNote: null,
          notifiedAt: null,
          notifyError: null,
          createdAt: at,
          updatedAt: at,
        }),
      );
    }
    this.logger.log(`Demo field reports (invented): ${seeds.length}, ${seeds.filter((s) => s.status === 'submitted').length} waiting on the review desk`);
  }
}
