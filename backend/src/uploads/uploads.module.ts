import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Attachment } from './entities/attachment.entity';
import { LocalDiskStorage, StorageService } from './storage.service';
import { UploadsService } from './uploads.service';

/** Checked, re-encoded uploads behind a storage driver (local disk under DATA_DIR/uploads). */
@Module({
  imports: [TypeOrmModule.forFeature([Attachment])],
  providers: [{ provide: StorageService, useClass: LocalDiskStorage }, UploadsService],
  exports: [StorageService, UploadsService, TypeOrmModule],
})
export class UploadsModule {}
