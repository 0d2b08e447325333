import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CacheVersion } from './cache-version.entity';
import { VersionedCache } from './versioned-cache.service';

@Global()
@Module({
  imports: [TypeOrmModule.forFeature([CacheVersion])],
  providers: [VersionedCache],
  exports: [VersionedCache],
})
export class CacheModule {}
