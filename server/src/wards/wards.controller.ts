import { Controller, Get } from '@nestjs/common';
import type { Ward } from '@lockstep/shared';
import { WardsService } from './wards.service.js';

@Controller('wards')
export class WardsController {
  constructor(private readonly wards: WardsService) {}

  @Get()
  list(): Promise<Ward[]> {
    return this.wards.list();
  }
}
