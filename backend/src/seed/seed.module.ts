import { Module } from '@nestjs/common';
import { CatalogueSeeder } from './catalogue.seeder';
import { KnowledgeModule } from '../knowledge/knowledge.module';
import { DemoAccountsSeeder } from './demo-accounts.seeder';
import { DemoJobsSeeder } from './demo-jobs.seeder';
import { KnowledgeSeeder } from './knowledge.seeder';
import { FieldReportsModule } from '../field-reports/field-reports.module';
import { FieldReportsSeeder } from './field-reports.seeder';
import { SeedService } from './seed.service';

@Module({
  imports: [KnowledgeModule, FieldReportsModule],
  providers: [SeedService, DemoAccountsSeeder, CatalogueSeeder, KnowledgeSeeder, DemoJobsSeeder, FieldReportsSeeder],
  exports: [SeedService],
})
export class SeedModule {}
