import { Module } from '@nestjs/common';
import { CatalogueSeeder } from './catalogue.seeder';
import { DemoAccountsSeeder } from './demo-accounts.seeder';
import { SeedService } from './seed.service';

@Module({
  providers: [SeedService, DemoAccountsSeeder, CatalogueSeeder],
  exports: [SeedService],
})
export class SeedModule {}
