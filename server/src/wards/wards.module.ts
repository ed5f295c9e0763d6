import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module.js';
import { WardPolicyChange } from './entities/ward-policy-change.entity.js';
import { Ward } from './entities/ward.entity.js';
import { WardPolicyChangesController } from './ward-policy-changes.controller.js';
import { WardPolicyChangesService } from './ward-policy-changes.service.js';
import { WardsController } from './wards.controller.js';
import { WardsService } from './wards.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Ward, WardPolicyChange]), UsersModule],
  controllers: [WardPolicyChangesController, WardsController],
  providers: [WardsService, WardPolicyChangesService],
  exports: [WardsService],
})
export class WardsModule {}
