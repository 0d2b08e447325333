import { Global, Module } from '@nestjs/common';
import { RunLeases } from './run-leases';

/** Database helpers every feature may use: leases of long-running jobs across instances. */
@Global()
@Module({ providers: [RunLeases], exports: [RunLeases] })
export class DatabaseModule {}
