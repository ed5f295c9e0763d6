import { Global, Module } from '@nestjs/common';
import { FlagsController } from './flags.controller.js';
import { FlagsService } from './flags.service.js';
import { WardEventsModule } from '../ward-events/ward-events.module.js';

@Global()
@Module({ imports: [WardEventsModule], controllers: [FlagsController], providers: [FlagsService], exports: [FlagsService] })
export class FlagsModule {}
