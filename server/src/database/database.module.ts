import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { Env } from '../config/env.validation.js';
import { fromRepoRoot } from '../config/paths.js';
import { dataSourceOptions } from './data-source-options.js';
import { serialiseTransactions } from './serial-transactions.js';
import { DemoSeeder } from './seed/demo-seeder.js';

@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Env, true>) => {
        const databasePath = config.get('DATABASE_PATH', { infer: true });
        mkdirSync(path.dirname(fromRepoRoot(databasePath)), { recursive: true });
        return { ...dataSourceOptions(databasePath), autoLoadEntities: true };
      },
      dataSourceFactory: async (options) => serialiseTransactions(await new DataSource(options!).initialize()),
    }),
  ],
  providers: [DemoSeeder],
})
export class DatabaseModule {}
