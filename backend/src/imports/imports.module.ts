import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CsvImport } from './entities/csv-import.entity';
import { ImportJob } from './entities/import-job.entity';
import { ImportMappingEntity } from './entities/import-mapping.entity';
import { ImportRow } from './entities/import-row.entity';
import { ImportsController } from './imports.controller';
import { ImportsService } from './imports.service';
import { ImportUploadInterceptor } from './upload.interceptor';

/** Scan-tool CSV import into vehicles, jobs and their codes (the tables of the vehicles and jobs modules). */
@Module({
  imports: [TypeOrmModule.forFeature([CsvImport, ImportMappingEntity, ImportRow, ImportJob])],
  controllers: [ImportsController],
  providers: [ImportsService, ImportUploadInterceptor],
})
export class ImportsModule {}
