import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module.js';
import { LibraryVersionEvent } from './entities/library-version-event.entity.js';
import { LibraryVersion } from './entities/library-version.entity.js';
import { LimitRule } from './entities/limit-rule.entity.js';
import { AffectedOrdersService } from './affected-orders.service.js';
import { LibraryCsvService } from './library-csv.service.js';
import { LibraryVersionsService } from './library-versions.service.js';
import { LibraryController } from './library.controller.js';
import { LibraryService } from './library.service.js';
import { WardLibraryController } from './ward-library.controller.js';

@Module({
  imports: [TypeOrmModule.forFeature([LibraryVersion, LimitRule, LibraryVersionEvent]), UsersModule],
  controllers: [LibraryController, WardLibraryController],
  providers: [LibraryService, LibraryVersionsService, LibraryCsvService, AffectedOrdersService],
  exports: [LibraryService],
})
export class LibraryModule {}
