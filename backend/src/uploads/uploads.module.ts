import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Attachment } from './entities/attachment.entity';
import { storageConfig } from './storage.config';
import { StorageService, storageProvider } from './storage.service';
import { UploadsService } from './uploads.service';

/** Checked, re-encoded uploads behind a storage driver (local disk under DATA_DIR/uploads, or S3-compatible object storage). */
@Module({
  imports: [TypeOrmModule.forFeature([Attachment]), ConfigModule.forFeature(storageConfig)],
  providers: [storageProvider, UploadsService],
  exports: [StorageService, UploadsService, TypeOrmModule],
})
export class UploadsModule {}
