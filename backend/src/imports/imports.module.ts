import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CsvImport } from './entities/csv-import.entity';
import { ImportDay } from './entities/import-day.entity';
import { ImportMappingEntity } from './entities/import-mapping.entity';
import { ImportsController } from './imports.controller';
import { ImportsService } from './imports.service';
import { ImportUploadInterceptor } from './upload.interceptor';

/** Scan-tool CSV import into vehicles, jobs and their codes (the tables of the vehicles and jobs modules). */
@Module({
  imports: [TypeOrmModule.forFeature([CsvImport, ImportMappingEntity, ImportDay])],
  controllers: [ImportsController],
  providers: [ImportsService, ImportUploadInterceptor],
})
export class ImportsModule {}
