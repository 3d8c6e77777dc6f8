import { Controller, Get, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Response } from 'express';
import { DataSource } from 'typeorm';
import { Public } from '../common/auth.decorators';
import { StorageService } from '../storage/storage.service';

const withTimeout = <T>(promise: Promise<T>, ms: number): Promise<T> =>
  Promise.race([promise, new Promise<T>((_, reject) => setTimeout(() => reject(new Error('timeout')), ms).unref())]);

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: StorageService,
  ) {}

  @Get()
  @Public()
  @ApiOperation({ summary: 'Liveness of the API, the database and object storage (503 while the database is down)' })
  async check(@Res({ passthrough: true }) res: Response): Promise<{ status: string; db: string; storage: string }> {
    const [db, storage] = await Promise.all([
      withTimeout(this.dataSource.query('SELECT 1'), 2000).then(() => 'up', () => 'down'),
      withTimeout(this.storage.isUp(), 2000).then((up) => (up ? 'up' : 'down'), () => 'down'),
    ]);
    if (db !== 'up') res.status(503);
    return { status: db === 'up' ? 'ok' : 'degraded', db, storage };
  }
}
