import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module.js';
import { LibraryVersion } from './entities/library-version.entity.js';
import { LimitRule } from './entities/limit-rule.entity.js';
import { LibraryCsvService } from './library-csv.service.js';
import { LibraryVersionsService } from './library-versions.service.js';
import { LibraryController } from './library.controller.js';
import { LibraryService } from './library.service.js';
import { WardLibraryController } from './ward-library.controller.js';

@Module({
  imports: [TypeOrmModule.forFeature([LibraryVersion, LimitRule]), UsersModule],
  controllers: [LibraryController, WardLibraryController],
  providers: [LibraryService, LibraryVersionsService, LibraryCsvService],
  exports: [LibraryService],
})
export class LibraryModule {}
