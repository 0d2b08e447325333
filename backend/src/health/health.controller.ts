import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { Public } from '../common/decorators/public.decorator';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  @Public()
  @Get()
  async health(): Promise<{ status: 'ok'; database: 'ok'; time: string }> {
    await this.dataSource.query('SELECT 1');
    return { status: 'ok', database: 'ok', time: new Date().toISOString() };
  }
}
