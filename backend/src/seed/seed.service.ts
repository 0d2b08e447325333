import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { appConfig, type AppConfig } from '../config/configuration';
import { withStartupLock } from '../database/startup-lock';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { User } from '../users/entities/user.entity';
import { CatalogueSeeder } from './catalogue.seeder';
import { DemoAccountsSeeder } from './demo-accounts.seeder';
import { DemoJobsSeeder } from './demo-jobs.seeder';
import { KnowledgeSeeder } from './knowledge.seeder';
import { FieldReportsSeeder } from './field-reports.seeder';

/**
 * On first start (an empty database) loads the demo scenario unless SEED_DEMO=false.
 * All of it in one transaction: a half-seeded database never exists.
 */
@Injectable()
export class SeedService implements OnApplicationBootstrap {
  private readonly logger = new Logger(SeedService.name);

  constructor(
    @Inject(appConfig.KEY) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly accounts: DemoAccountsSeeder,
    private readonly catalogue: CatalogueSeeder,
    private readonly knowledge: KnowledgeSeeder,
    private readonly demoJobs: DemoJobsSeeder,
    private readonly fieldReports: FieldReportsSeeder,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    // Instances starting together on one PostgreSQL seed one after the other: the second sees the first's rows.
    await withStartupLock(this.dataSource, async () => {
      if ((await this.dataSource.getRepository(DtcCode).count()) === 0) {
        await this.dataSource.transaction((em) => this.catalogue.run(em));
      }
      if (!this.config.seedDemo) return;
      if ((await this.dataSource.getRepository(User).count()) > 0) return;
      await this.seedDemo();
    });
  }

  async seedDemo(): Promise<void> {
    this.logger.log('Empty database: loading the invented demo scenario');
    await this.dataSource.transaction(async (em) => {
      const shops = await this.accounts.run(em);
      await this.knowledge.run(em, shops);
      await this.demoJobs.run(em, shops);
      await this.fieldReports.run(em);
    });
  }
}
