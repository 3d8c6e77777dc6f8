import { Controller, Get, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Response } from 'express';
import { DataSource } from 'typeorm';
import { Public } from '../common/auth.decorators';
import { MailService } from '../mail/mail.service';
import { StorageService } from '../storage/storage.service';

const PROBE_TIMEOUT_MS = 2000;
// A burst of health calls shares one probe of the object store and the relay instead of opening a connection each.
const PROBE_REUSE_MS = 3000;

type ComponentState = 'up' | 'down';
interface HealthReport {
  status: 'ok' | 'degraded';
  db: ComponentState;
  storage: ComponentState;
  mail: ComponentState;
  /** The components that did not answer, e.g. ["storage", "mail"]; empty when status is "ok". */
  down: string[];
}

const withTimeout = <T>(promise: Promise<T>, ms: number): Promise<T> =>
  Promise.race([promise, new Promise<T>((_, reject) => setTimeout(() => reject(new Error('timeout')), ms).unref())]);

/** "down" when the check throws, times out or answers false. */
const probe = (check: () => Promise<unknown>): Promise<ComponentState> =>
  withTimeout(check(), PROBE_TIMEOUT_MS).then(
    (result) => (result === false ? 'down' : 'up'),
    () => 'down',
  );

@ApiTags('health')
@Controller('health')
export class HealthController {
  private readonly recent = new Map<'storage' | 'mail', { at: number; state: Promise<ComponentState> }>();

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: StorageService,
    private readonly mail: MailService,
  ) {}

  @Get()
  @Public()
  @ApiOperation({
    summary: 'Liveness of the API, the database, object storage and the mail relay',
    description: 'status is "degraded" when any of them is down, and down names them; the answer is 503 only while the database is down.',
  })
  async check(@Res({ passthrough: true }) res: Response): Promise<HealthReport> {
    const [db, storage, mail] = await Promise.all([
      probe(() => this.dataSource.query('SELECT 1')),
      this.probeShared('storage', () => this.storage.isUp()),
      this.probeShared('mail', () => this.mail.isUp()),
    ]);
    const components = { db, storage, mail };
    const down = Object.entries(components)
      .filter(([, state]) => state === 'down')
      .map(([name]) => name);
    // Without the database nothing works; without storage or mail the rest still serves, so a load balancer keeps it.
    if (db !== 'up') res.status(503);
    return { status: down.length === 0 ? 'ok' : 'degraded', ...components, down };
  }

  private probeShared(name: 'storage' | 'mail', check: () => Promise<boolean>): Promise<ComponentState> {
    const last = this.recent.get(name);
    if (last && Date.now() - last.at < PROBE_REUSE_MS) return last.state;
    const state = probe(check);
    this.recent.set(name, { at: Date.now(), state });
    return state;
  }
}
