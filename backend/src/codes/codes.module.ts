import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CatalogueImportService } from './catalogue-import.service';
import { CodesController } from './codes.controller';
import { CodesService } from './codes.service';
import { DtcCode } from './entities/dtc-code.entity';
import { SafetyCaution } from './entities/safety-caution.entity';

@Module({
  imports: [TypeOrmModule.forFeature([DtcCode, SafetyCaution])],
  controllers: [CodesController],
  providers: [CodesService, CatalogueImportService],
  exports: [CodesService],
})
export class CodesModule {}
