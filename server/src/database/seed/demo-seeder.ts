import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env.validation.js';
import { seedDemoDataIfEmpty } from './demo-seed.js';

/** With DEMO on, fills an empty database with the demo scenario at start. */
@Injectable()
export class DemoSeeder implements OnApplicationBootstrap {
  private readonly logger = new Logger('Demo');

  constructor(
    private readonly config: ConfigService<Env, true>,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.get('DEMO', { infer: true })) return;
    const started = performance.now();
    const seeded = await seedDemoDataIfEmpty(this.dataSource);
    const ms = Math.round(performance.now() - started);
    if (seeded) this.logger.log(`Empty database: seeded the demo hospital mid-shift in ${ms} ms (all demo passwords: lockstep-demo)`);
  }
}
