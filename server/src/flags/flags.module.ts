import { Global, Module } from '@nestjs/common';
import { FlagsController } from './flags.controller.js';
import { FlagsService } from './flags.service.js';

@Global()
@Module({ controllers: [FlagsController], providers: [FlagsService], exports: [FlagsService] })
export class FlagsModule {}
