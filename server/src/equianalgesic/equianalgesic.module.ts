import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module.js';
import { EquianalgesicController } from './equianalgesic.controller.js';
import { EquianalgesicService } from './equianalgesic.service.js';

@Module({
  imports: [UsersModule],
  controllers: [EquianalgesicController],
  providers: [EquianalgesicService],
  exports: [EquianalgesicService],
})
export class EquianalgesicModule {}
